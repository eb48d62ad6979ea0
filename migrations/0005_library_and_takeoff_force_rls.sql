-- Custom SQL migration file, put your code below! --
ALTER TABLE "products" FORCE ROW LEVEL SECURITY;
ALTER TABLE "finish_systems" FORCE ROW LEVEL SECURITY;
ALTER TABLE "rooms" FORCE ROW LEVEL SECURITY;
ALTER TABLE "surfaces" FORCE ROW LEVEL SECURITY;

GRANT SELECT, INSERT, UPDATE, DELETE ON "products", "finish_systems", "rooms", "surfaces" TO layerbook_app, layerbook_jobs;
