ALTER TABLE "proposal_versions" ADD COLUMN "result" jsonb;--> statement-breakpoint
-- Versions made before: the estimate's result as saved now (an accepted estimate no longer changes, so an accepted
-- version gets what it was made from). The owner reads past row-level security only inside this transaction.
ALTER TABLE proposal_versions NO FORCE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE estimates NO FORCE ROW LEVEL SECURITY;--> statement-breakpoint
UPDATE proposal_versions pv SET result = e.result FROM estimates e WHERE e.tenant_id = pv.tenant_id AND e.id = pv.estimate_id;--> statement-breakpoint
ALTER TABLE proposal_versions FORCE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE estimates FORCE ROW LEVEL SECURITY;
