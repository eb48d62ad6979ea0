-- Custom SQL migration file, put your code below! --
-- Progress photos are firm data: forced row-level security, DML for the web role (uploads and deletes).
ALTER TABLE "job_photos" FORCE ROW LEVEL SECURITY;
GRANT SELECT, INSERT, UPDATE, DELETE ON "job_photos" TO layerbook_app;
