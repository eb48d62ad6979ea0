CREATE TABLE "checkout_sessions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"tenant_id" uuid NOT NULL,
	"invoice_id" uuid NOT NULL,
	"client_id" uuid NOT NULL,
	"processor_session_id" text NOT NULL,
	"amount" numeric(14, 2) NOT NULL,
	"currency" text NOT NULL,
	"status" text DEFAULT 'open' NOT NULL,
	"url" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"completed_at" timestamp with time zone
);
--> statement-breakpoint
ALTER TABLE "checkout_sessions" ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE TABLE "client_credits" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"tenant_id" uuid NOT NULL,
	"client_id" uuid NOT NULL,
	"payment_id" uuid NOT NULL,
	"amount" numeric(14, 2) NOT NULL,
	"currency" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"used_on_invoice_id" uuid,
	"meta" jsonb,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "client_credits" ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE TABLE "processor_events" (
	"id" text PRIMARY KEY NOT NULL,
	"tenant_id" uuid NOT NULL,
	"type" text NOT NULL,
	"processor_created" bigint NOT NULL,
	"payload" jsonb NOT NULL,
	"received_via" text NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL,
	"applied_at" timestamp with time zone,
	"outcome" text
);
--> statement-breakpoint
ALTER TABLE "processor_events" ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE TABLE "processor_sync" (
	"account" text PRIMARY KEY NOT NULL,
	"last_event_id" text,
	"last_event_created" bigint,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "refunds" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"tenant_id" uuid NOT NULL,
	"payment_id" uuid NOT NULL,
	"invoice_id" uuid NOT NULL,
	"client_id" uuid NOT NULL,
	"method" text NOT NULL,
	"status" text NOT NULL,
	"amount" numeric(14, 2) NOT NULL,
	"currency" text NOT NULL,
	"refunded_on" date NOT NULL,
	"reason" text DEFAULT '' NOT NULL,
	"reference" text DEFAULT '' NOT NULL,
	"processor_refund_id" text,
	"failure_message" text,
	"receipt_no" integer,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "refunds_amount_positive" CHECK (amount > 0)
);
--> statement-breakpoint
ALTER TABLE "refunds" ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE "payments" ADD COLUMN "amount_applied" numeric(14, 2);--> statement-breakpoint
-- Payments recorded before this went wholly on their invoice (offline payments were capped at the amount due).
ALTER TABLE "payments" NO FORCE ROW LEVEL SECURITY;--> statement-breakpoint
UPDATE "payments" SET "amount_applied" = "amount";--> statement-breakpoint
ALTER TABLE "payments" FORCE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE "payments" ALTER COLUMN "amount_applied" SET NOT NULL;--> statement-breakpoint
ALTER TABLE "payments" ADD COLUMN "amount_refunded" numeric(14, 2) DEFAULT '0' NOT NULL;--> statement-breakpoint
ALTER TABLE "payments" ADD COLUMN "receipt_no" integer;--> statement-breakpoint
ALTER TABLE "payments" ADD COLUMN "processor_session_id" text;--> statement-breakpoint
ALTER TABLE "payments" ADD COLUMN "processor_payment_intent_id" text;--> statement-breakpoint
ALTER TABLE "checkout_sessions" ADD CONSTRAINT "checkout_sessions_tenant_id_firms_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."firms"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "checkout_sessions" ADD CONSTRAINT "checkout_sessions_invoice_id_invoices_id_fk" FOREIGN KEY ("invoice_id") REFERENCES "public"."invoices"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "checkout_sessions" ADD CONSTRAINT "checkout_sessions_client_id_clients_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_credits" ADD CONSTRAINT "client_credits_tenant_id_firms_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."firms"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_credits" ADD CONSTRAINT "client_credits_client_id_clients_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_credits" ADD CONSTRAINT "client_credits_payment_id_payments_id_fk" FOREIGN KEY ("payment_id") REFERENCES "public"."payments"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_credits" ADD CONSTRAINT "client_credits_used_on_invoice_id_invoices_id_fk" FOREIGN KEY ("used_on_invoice_id") REFERENCES "public"."invoices"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "processor_events" ADD CONSTRAINT "processor_events_tenant_id_firms_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."firms"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refunds" ADD CONSTRAINT "refunds_tenant_id_firms_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."firms"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refunds" ADD CONSTRAINT "refunds_payment_id_payments_id_fk" FOREIGN KEY ("payment_id") REFERENCES "public"."payments"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refunds" ADD CONSTRAINT "refunds_invoice_id_invoices_id_fk" FOREIGN KEY ("invoice_id") REFERENCES "public"."invoices"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refunds" ADD CONSTRAINT "refunds_client_id_clients_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refunds" ADD CONSTRAINT "refunds_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "checkout_sessions_processor_uq" ON "checkout_sessions" USING btree ("processor_session_id");--> statement-breakpoint
CREATE INDEX "checkout_sessions_invoice_idx" ON "checkout_sessions" USING btree ("tenant_id","invoice_id");--> statement-breakpoint
CREATE INDEX "client_credits_client_idx" ON "client_credits" USING btree ("tenant_id","client_id");--> statement-breakpoint
CREATE INDEX "processor_events_unapplied_idx" ON "processor_events" USING btree ("tenant_id","received_at") WHERE applied_at is null;--> statement-breakpoint
CREATE INDEX "refunds_payment_idx" ON "refunds" USING btree ("tenant_id","payment_id");--> statement-breakpoint
CREATE UNIQUE INDEX "refunds_processor_uq" ON "refunds" USING btree ("processor_refund_id") WHERE processor_refund_id is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "refunds_receipt_uq" ON "refunds" USING btree ("tenant_id","receipt_no") WHERE receipt_no is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "payments_processor_session_uq" ON "payments" USING btree ("processor_session_id") WHERE processor_session_id is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "payments_receipt_uq" ON "payments" USING btree ("tenant_id","receipt_no") WHERE receipt_no is not null;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_refund_le_amount" CHECK (amount_refunded >= 0 and amount_refunded <= amount);--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_applied_le_amount" CHECK (amount_applied >= 0 and amount_applied <= amount);--> statement-breakpoint
CREATE POLICY "checkout_sessions_tenant_isolation" ON "checkout_sessions" AS PERMISSIVE FOR ALL TO public USING (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid) WITH CHECK (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid);--> statement-breakpoint
CREATE POLICY "client_credits_tenant_isolation" ON "client_credits" AS PERMISSIVE FOR ALL TO public USING (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid) WITH CHECK (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid);--> statement-breakpoint
CREATE POLICY "processor_events_tenant_isolation" ON "processor_events" AS PERMISSIVE FOR ALL TO public USING (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid) WITH CHECK (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid);--> statement-breakpoint
CREATE POLICY "refunds_tenant_isolation" ON "refunds" AS PERMISSIVE FOR ALL TO public USING (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid) WITH CHECK (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid);