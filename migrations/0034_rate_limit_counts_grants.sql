-- Custom SQL migration file, put your code below! --
-- Rate limit counts: not firm data; the web role counts per address and clears expired rows.
GRANT SELECT, INSERT, UPDATE, DELETE ON "rate_limit_counts" TO layerbook_app;
--> statement-breakpoint
-- The metrics count the outbox's unsent mail at scrape time (server/src/health/queue-metrics.ts):
-- a partial index keeps that to the unsent rows however long the sent history grows.
CREATE INDEX "mail_outbox_unsent" ON "mail_outbox" ("status", "created_at") WHERE status <> 'sent';
