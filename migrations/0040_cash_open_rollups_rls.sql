-- Custom SQL migration file, put your code below! --
-- The open balances rolled up per due date and per client (packages/db/src/schema/cash.ts), kept by the same function
-- as cash_open_balances, so all three move in the same statement as the invoice write. Rows are taken in one order
-- (client and day, then day, then client) by every writer.
CREATE OR REPLACE FUNCTION cash_open_balance_add(t uuid, c uuid, d date, amount numeric, n integer) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO cash_open_balances AS b (tenant_id, client_id, due_on, owed, invoice_count) VALUES (t, c, d, amount, n)
    ON CONFLICT (tenant_id, client_id, due_on)
    DO UPDATE SET owed = b.owed + excluded.owed, invoice_count = b.invoice_count + excluded.invoice_count;
  INSERT INTO cash_open_due_days AS b (tenant_id, due_on, owed, invoice_count) VALUES (t, d, amount, n)
    ON CONFLICT (tenant_id, due_on)
    DO UPDATE SET owed = b.owed + excluded.owed, invoice_count = b.invoice_count + excluded.invoice_count;
  INSERT INTO cash_open_clients AS b (tenant_id, client_id, owed, invoice_count) VALUES (t, c, amount, n)
    ON CONFLICT (tenant_id, client_id)
    DO UPDATE SET owed = b.owed + excluded.owed, invoice_count = b.invoice_count + excluded.invoice_count;
  IF n < 0 THEN
    DELETE FROM cash_open_balances WHERE tenant_id = t AND client_id = c AND due_on = d AND invoice_count = 0;
    DELETE FROM cash_open_due_days WHERE tenant_id = t AND due_on = d AND invoice_count = 0;
    DELETE FROM cash_open_clients WHERE tenant_id = t AND client_id = c AND invoice_count = 0;
  END IF;
END $$;

-- Backfill from the per-client-and-day rows, every firm at once (the owner reads past row-level security only inside
-- this transaction, as in cash_figures_rls).
ALTER TABLE cash_open_balances NO FORCE ROW LEVEL SECURITY;
INSERT INTO cash_open_due_days (tenant_id, due_on, owed, invoice_count)
  SELECT tenant_id, due_on, sum(owed), sum(invoice_count) FROM cash_open_balances GROUP BY tenant_id, due_on;
INSERT INTO cash_open_clients (tenant_id, client_id, owed, invoice_count)
  SELECT tenant_id, client_id, sum(owed), sum(invoice_count) FROM cash_open_balances GROUP BY tenant_id, client_id;
ALTER TABLE cash_open_balances FORCE ROW LEVEL SECURITY;

ALTER TABLE "cash_open_due_days" FORCE ROW LEVEL SECURITY;
ALTER TABLE "cash_open_clients" FORCE ROW LEVEL SECURITY;
GRANT SELECT, INSERT, UPDATE, DELETE ON "cash_open_due_days", "cash_open_clients" TO layerbook_app, layerbook_jobs;
