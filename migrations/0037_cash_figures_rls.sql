-- Custom SQL migration file, put your code below! --
-- The Cash page's figures, kept by triggers in the same transaction as each write (see packages/db/src/schema/cash.ts).
-- Trigger functions run as the writing role (not SECURITY DEFINER), so row-level security applies to them as to the write.

-- Adds (or with negative amounts takes away) an open balance; a row whose last invoice left goes.
CREATE FUNCTION cash_open_balance_add(t uuid, c uuid, d date, amount numeric, n integer) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO cash_open_balances AS b (tenant_id, client_id, due_on, owed, invoice_count) VALUES (t, c, d, amount, n)
    ON CONFLICT (tenant_id, client_id, due_on)
    DO UPDATE SET owed = b.owed + excluded.owed, invoice_count = b.invoice_count + excluded.invoice_count;
  IF n < 0 THEN
    DELETE FROM cash_open_balances WHERE tenant_id = t AND client_id = c AND due_on = d AND invoice_count = 0;
  END IF;
END $$;

CREATE FUNCTION cash_job_add(t uuid, j uuid, issued numeric, credited numeric, paid numeric, change_orders numeric) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO cash_job_totals AS s (tenant_id, job_id, issued, credited, paid, change_orders) VALUES (t, j, issued, credited, paid, change_orders)
    ON CONFLICT (tenant_id, job_id)
    DO UPDATE SET issued = s.issued + excluded.issued, credited = s.credited + excluded.credited, paid = s.paid + excluded.paid,
                  change_orders = s.change_orders + excluded.change_orders;
END $$;

CREATE FUNCTION cash_received_add(t uuid, k text, d date, amount numeric, n integer) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO cash_received_days AS r (tenant_id, kind, day, amount, count) VALUES (t, k, d, amount, n)
    ON CONFLICT (tenant_id, kind, day) DO UPDATE SET amount = r.amount + excluded.amount, count = r.count + excluded.count;
  IF n < 0 THEN
    DELETE FROM cash_received_days WHERE tenant_id = t AND kind = k AND day = d AND count = 0;
  END IF;
END $$;

-- An invoice's parts: what is still owed while it is open (by client and due date), and its job's money once past draft.
CREATE FUNCTION cash_invoices_keep() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'UPDATE' AND (OLD.tenant_id, OLD.status, OLD.due_on, OLD.client_id, OLD.job_id, OLD.total, OLD.amount_paid, OLD.amount_credited)
      IS NOT DISTINCT FROM (NEW.tenant_id, NEW.status, NEW.due_on, NEW.client_id, NEW.job_id, NEW.total, NEW.amount_paid, NEW.amount_credited) THEN
    RETURN NULL;
  END IF;
  IF TG_OP IN ('UPDATE', 'DELETE') THEN
    IF OLD.status IN ('issued', 'part_paid', 'refunded') AND OLD.due_on IS NOT NULL AND OLD.total - OLD.amount_paid - OLD.amount_credited > 0 THEN
      PERFORM cash_open_balance_add(OLD.tenant_id, OLD.client_id, OLD.due_on, -(OLD.total - OLD.amount_paid - OLD.amount_credited), -1);
    END IF;
    IF OLD.status <> 'draft' THEN
      PERFORM cash_job_add(OLD.tenant_id, OLD.job_id, -OLD.total, -OLD.amount_credited, -OLD.amount_paid, 0);
    END IF;
  END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') THEN
    IF NEW.status IN ('issued', 'part_paid', 'refunded') AND NEW.due_on IS NOT NULL AND NEW.total - NEW.amount_paid - NEW.amount_credited > 0 THEN
      PERFORM cash_open_balance_add(NEW.tenant_id, NEW.client_id, NEW.due_on, NEW.total - NEW.amount_paid - NEW.amount_credited, 1);
    END IF;
    IF NEW.status <> 'draft' THEN
      PERFORM cash_job_add(NEW.tenant_id, NEW.job_id, NEW.total, NEW.amount_credited, NEW.amount_paid, 0);
    END IF;
  END IF;
  RETURN NULL;
END $$;

CREATE FUNCTION cash_change_orders_keep() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') AND OLD.status = 'approved' THEN
    PERFORM cash_job_add(OLD.tenant_id, OLD.job_id, 0, 0, 0, -OLD.amount);
  END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') AND NEW.status = 'approved' THEN
    PERFORM cash_job_add(NEW.tenant_id, NEW.job_id, 0, 0, 0, NEW.amount);
  END IF;
  RETURN NULL;
END $$;

-- Every payment counts on its received date.
CREATE FUNCTION cash_payments_keep() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') THEN
    PERFORM cash_received_add(OLD.tenant_id, 'payment', OLD.received_on, -OLD.amount, -1);
  END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') THEN
    PERFORM cash_received_add(NEW.tenant_id, 'payment', NEW.received_on, NEW.amount, 1);
  END IF;
  RETURN NULL;
END $$;

-- A refund counts on its refund date once it went through.
CREATE FUNCTION cash_refunds_keep() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') AND OLD.status = 'succeeded' THEN
    PERFORM cash_received_add(OLD.tenant_id, 'refund', OLD.refunded_on, -OLD.amount, -1);
  END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') AND NEW.status = 'succeeded' THEN
    PERFORM cash_received_add(NEW.tenant_id, 'refund', NEW.refunded_on, NEW.amount, 1);
  END IF;
  RETURN NULL;
END $$;

CREATE TRIGGER cash_invoices_keep AFTER INSERT OR DELETE OR UPDATE OF tenant_id, status, due_on, client_id, job_id, total, amount_paid, amount_credited
  ON invoices FOR EACH ROW EXECUTE FUNCTION cash_invoices_keep();
CREATE TRIGGER cash_change_orders_keep AFTER INSERT OR DELETE OR UPDATE OF tenant_id, job_id, status, amount
  ON change_orders FOR EACH ROW EXECUTE FUNCTION cash_change_orders_keep();
CREATE TRIGGER cash_payments_keep AFTER INSERT OR DELETE OR UPDATE OF tenant_id, received_on, amount
  ON payments FOR EACH ROW EXECUTE FUNCTION cash_payments_keep();
CREATE TRIGGER cash_refunds_keep AFTER INSERT OR DELETE OR UPDATE OF tenant_id, status, refunded_on, amount
  ON refunds FOR EACH ROW EXECUTE FUNCTION cash_refunds_keep();

-- Backfill from the rows already there, every firm at once: the owner reads past row-level security only inside this
-- transaction (the tables are locked by the ALTERs until it commits), and forcing is restored before it ends.
ALTER TABLE invoices NO FORCE ROW LEVEL SECURITY;
ALTER TABLE change_orders NO FORCE ROW LEVEL SECURITY;
ALTER TABLE payments NO FORCE ROW LEVEL SECURITY;
ALTER TABLE refunds NO FORCE ROW LEVEL SECURITY;

INSERT INTO cash_open_balances (tenant_id, client_id, due_on, owed, invoice_count)
  SELECT tenant_id, client_id, due_on, sum(total - amount_paid - amount_credited), count(*) FROM invoices
   WHERE status IN ('issued', 'part_paid', 'refunded') AND due_on IS NOT NULL AND total - amount_paid - amount_credited > 0
   GROUP BY tenant_id, client_id, due_on;
INSERT INTO cash_job_totals (tenant_id, job_id, issued, credited, paid, change_orders)
  SELECT tenant_id, job_id, sum(issued), sum(credited), sum(paid), sum(change_orders) FROM (
    SELECT tenant_id, job_id, total AS issued, amount_credited AS credited, amount_paid AS paid, 0 AS change_orders
      FROM invoices WHERE status <> 'draft'
    UNION ALL
    SELECT tenant_id, job_id, 0, 0, 0, amount FROM change_orders WHERE status = 'approved') parts
   GROUP BY tenant_id, job_id;
INSERT INTO cash_received_days (tenant_id, kind, day, amount, count)
  SELECT tenant_id, 'payment', received_on, sum(amount), count(*) FROM payments GROUP BY tenant_id, received_on
  UNION ALL
  SELECT tenant_id, 'refund', refunded_on, sum(amount), count(*) FROM refunds WHERE status = 'succeeded' GROUP BY tenant_id, refunded_on;

ALTER TABLE invoices FORCE ROW LEVEL SECURITY;
ALTER TABLE change_orders FORCE ROW LEVEL SECURITY;
ALTER TABLE payments FORCE ROW LEVEL SECURITY;
ALTER TABLE refunds FORCE ROW LEVEL SECURITY;

-- Firm data: forced row-level security for every role; the web and job roles write them through the triggers above.
ALTER TABLE "cash_open_balances" FORCE ROW LEVEL SECURITY;
ALTER TABLE "cash_received_days" FORCE ROW LEVEL SECURITY;
ALTER TABLE "cash_job_totals" FORCE ROW LEVEL SECURITY;
GRANT SELECT, INSERT, UPDATE, DELETE ON "cash_open_balances", "cash_received_days", "cash_job_totals" TO layerbook_app, layerbook_jobs;
