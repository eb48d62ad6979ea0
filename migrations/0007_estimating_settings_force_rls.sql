-- Custom SQL migration file, put your code below! --
ALTER TABLE "firm_estimating_settings" FORCE ROW LEVEL SECURITY;
GRANT SELECT, INSERT, UPDATE, DELETE ON "firm_estimating_settings" TO layerbook_app, layerbook_jobs;
