-- Custom SQL migration file, put your code below! --
ALTER TABLE "clients" FORCE ROW LEVEL SECURITY;
ALTER TABLE "client_contacts" FORCE ROW LEVEL SECURITY;
ALTER TABLE "sites" FORCE ROW LEVEL SECURITY;
ALTER TABLE "inquiries" FORCE ROW LEVEL SECURITY;
ALTER TABLE "inquiry_activities" FORCE ROW LEVEL SECURITY;
ALTER TABLE "inquiry_stage_settings" FORCE ROW LEVEL SECURITY;

GRANT SELECT, INSERT, UPDATE, DELETE ON "clients", "client_contacts", "sites", "inquiries", "inquiry_stage_settings" TO layerbook_app, layerbook_jobs;
-- Activity is history: added to, never edited.
GRANT SELECT, INSERT ON "inquiry_activities" TO layerbook_app, layerbook_jobs;
