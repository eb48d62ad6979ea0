-- Custom SQL migration file, put your code below! ---- Row-level security applies to the table owner too (FORCE), so no role but a superuser skips it.
ALTER TABLE "firms" FORCE ROW LEVEL SECURITY;
ALTER TABLE "memberships" FORCE ROW LEVEL SECURITY;
ALTER TABLE "invitations" FORCE ROW LEVEL SECURITY;
ALTER TABLE "portal_users" FORCE ROW LEVEL SECURITY;
ALTER TABLE "portal_links" FORCE ROW LEVEL SECURITY;
ALTER TABLE "audit_log" FORCE ROW LEVEL SECURITY;
ALTER TABLE "mail_outbox" FORCE ROW LEVEL SECURITY;

-- The web role: DML only, no DDL, no ownership.
GRANT USAGE ON SCHEMA public TO layerbook_app, layerbook_jobs;
GRANT SELECT, INSERT, UPDATE, DELETE ON "firms", "memberships", "invitations", "portal_users", "portal_links",
  "users", "password_resets", "session" TO layerbook_app;
-- The audit log is append-only for the web role.
GRANT SELECT, INSERT ON "audit_log" TO layerbook_app;
-- Outbox bodies carry one-time links: the web role may only add rows; the jobs role sends them.
GRANT INSERT ON "mail_outbox" TO layerbook_app;
-- ON CONFLICT (purpose_key) needs to read the arbiter column, and only that one.
GRANT SELECT ("purpose_key") ON "mail_outbox" TO layerbook_app;
GRANT SELECT, INSERT, UPDATE ON "mail_outbox" TO layerbook_jobs;
GRANT SELECT, INSERT, UPDATE, DELETE ON "firms", "memberships", "invitations", "portal_users", "portal_links",
  "users", "password_resets" TO layerbook_jobs;
GRANT SELECT, INSERT ON "audit_log" TO layerbook_jobs;
