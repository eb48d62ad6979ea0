-- Custom SQL migration file, put your code below! --
-- Money received counts only in the currency its invoice asked for. A card payment the processor took in another
-- currency is kept whole as the client's credit and noted for a person (payments/fulfil.ts); adding it to the
-- firm's received figures would add, say, euros to dollars. Its refunds likewise.
CREATE OR REPLACE FUNCTION cash_payments_keep() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') AND OLD.currency = (SELECT i.currency FROM invoices i WHERE i.tenant_id = OLD.tenant_id AND i.id = OLD.invoice_id) THEN
    PERFORM cash_received_add(OLD.tenant_id, 'payment', OLD.received_on, -OLD.amount, -1);
  END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') AND NEW.currency = (SELECT i.currency FROM invoices i WHERE i.tenant_id = NEW.tenant_id AND i.id = NEW.invoice_id) THEN
    PERFORM cash_received_add(NEW.tenant_id, 'payment', NEW.received_on, NEW.amount, 1);
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE OR REPLACE FUNCTION cash_refunds_keep() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') AND OLD.status = 'succeeded'
     AND OLD.currency = (SELECT i.currency FROM invoices i WHERE i.tenant_id = OLD.tenant_id AND i.id = OLD.invoice_id) THEN
    PERFORM cash_received_add(OLD.tenant_id, 'refund', OLD.refunded_on, -OLD.amount, -1);
  END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') AND NEW.status = 'succeeded'
     AND NEW.currency = (SELECT i.currency FROM invoices i WHERE i.tenant_id = NEW.tenant_id AND i.id = NEW.invoice_id) THEN
    PERFORM cash_received_add(NEW.tenant_id, 'refund', NEW.refunded_on, NEW.amount, 1);
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
-- Rebuilt from the rows, every firm at once (the owner reads past row-level security only inside this transaction, as
-- in cash_figures_rls), so what was counted in another currency before goes.
ALTER TABLE payments NO FORCE ROW LEVEL SECURITY;
ALTER TABLE refunds NO FORCE ROW LEVEL SECURITY;
ALTER TABLE invoices NO FORCE ROW LEVEL SECURITY;
ALTER TABLE cash_received_days NO FORCE ROW LEVEL SECURITY;
DELETE FROM cash_received_days;
INSERT INTO cash_received_days (tenant_id, kind, day, amount, count)
  SELECT p.tenant_id, 'payment', p.received_on, sum(p.amount), count(*) FROM payments p
    JOIN invoices i ON i.tenant_id = p.tenant_id AND i.id = p.invoice_id AND i.currency = p.currency
   GROUP BY p.tenant_id, p.received_on
  UNION ALL
  SELECT r.tenant_id, 'refund', r.refunded_on, sum(r.amount), count(*) FROM refunds r
    JOIN invoices i ON i.tenant_id = r.tenant_id AND i.id = r.invoice_id AND i.currency = r.currency
   WHERE r.status = 'succeeded' GROUP BY r.tenant_id, r.refunded_on;
ALTER TABLE payments FORCE ROW LEVEL SECURITY;
ALTER TABLE refunds FORCE ROW LEVEL SECURITY;
ALTER TABLE invoices FORCE ROW LEVEL SECURITY;
ALTER TABLE cash_received_days FORCE ROW LEVEL SECURITY;
