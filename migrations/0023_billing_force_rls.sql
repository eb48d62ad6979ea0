-- Custom SQL migration file, put your code below! --
-- Billing tables are firm data: forced row-level security for every role, DML for the web and job roles.
ALTER TABLE "firm_billing_settings" FORCE ROW LEVEL SECURITY;
ALTER TABLE "document_counters" FORCE ROW LEVEL SECURITY;
ALTER TABLE "change_orders" FORCE ROW LEVEL SECURITY;
ALTER TABLE "invoices" FORCE ROW LEVEL SECURITY;
ALTER TABLE "credit_notes" FORCE ROW LEVEL SECURITY;
ALTER TABLE "invoice_reminders" FORCE ROW LEVEL SECURITY;
ALTER TABLE "payments" FORCE ROW LEVEL SECURITY;
ALTER TABLE "job_work_items" FORCE ROW LEVEL SECURITY;
ALTER TABLE "job_value_lines" FORCE ROW LEVEL SECURITY;
ALTER TABLE "job_progress" FORCE ROW LEVEL SECURITY;
GRANT SELECT, INSERT, UPDATE, DELETE ON "firm_billing_settings", "change_orders", "invoices", "job_work_items", "job_value_lines", "payments"
  TO layerbook_app, layerbook_jobs;
-- Counters only move forward; history, reminders and credit notes are append-only.
GRANT SELECT, INSERT, UPDATE ON "document_counters" TO layerbook_app, layerbook_jobs;
GRANT SELECT, INSERT ON "credit_notes", "invoice_reminders", "job_progress" TO layerbook_app, layerbook_jobs;
