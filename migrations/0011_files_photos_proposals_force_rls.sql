-- Custom SQL migration file, put your code below! --
ALTER TABLE "files" FORCE ROW LEVEL SECURITY;
ALTER TABLE "room_photos" FORCE ROW LEVEL SECURITY;
ALTER TABLE "proposal_versions" FORCE ROW LEVEL SECURITY;

GRANT SELECT, INSERT, UPDATE, DELETE ON "files", "room_photos" TO layerbook_app, layerbook_jobs;
-- A sent version is frozen; versions are never deleted (what a client signed is kept).
GRANT SELECT, INSERT, UPDATE ON "proposal_versions" TO layerbook_app, layerbook_jobs;
