-- Custom SQL migration file, put your code below! --
-- Payment tables are firm data: forced row-level security for every role, DML for the web and job roles.
ALTER TABLE "refunds" FORCE ROW LEVEL SECURITY;
ALTER TABLE "checkout_sessions" FORCE ROW LEVEL SECURITY;
ALTER TABLE "processor_events" FORCE ROW LEVEL SECURITY;
ALTER TABLE "client_credits" FORCE ROW LEVEL SECURITY;
GRANT SELECT, INSERT, UPDATE ON "refunds", "checkout_sessions", "processor_events", "client_credits" TO layerbook_app, layerbook_jobs;
-- The reconciliation cursor holds no firm data (an event id and a time); only the job role uses it.
GRANT SELECT, INSERT, UPDATE ON "processor_sync" TO layerbook_jobs;
