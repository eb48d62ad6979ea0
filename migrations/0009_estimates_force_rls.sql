-- Custom SQL migration file, put your code below! --
ALTER TABLE "estimates" FORCE ROW LEVEL SECURITY;
GRANT SELECT, INSERT, UPDATE, DELETE ON "estimates" TO layerbook_app, layerbook_jobs;
