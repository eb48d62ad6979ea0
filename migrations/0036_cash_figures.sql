CREATE TABLE "cash_job_totals" (
	"tenant_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"issued" numeric(14, 2) DEFAULT '0' NOT NULL,
	"credited" numeric(14, 2) DEFAULT '0' NOT NULL,
	"paid" numeric(14, 2) DEFAULT '0' NOT NULL,
	"change_orders" numeric(14, 2) DEFAULT '0' NOT NULL,
	CONSTRAINT "cash_job_totals_tenant_id_job_id_pk" PRIMARY KEY("tenant_id","job_id")
);
--> statement-breakpoint
ALTER TABLE "cash_job_totals" ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE TABLE "cash_open_balances" (
	"tenant_id" uuid NOT NULL,
	"client_id" uuid NOT NULL,
	"due_on" date NOT NULL,
	"owed" numeric(14, 2) NOT NULL,
	"invoice_count" integer NOT NULL,
	CONSTRAINT "cash_open_balances_tenant_id_client_id_due_on_pk" PRIMARY KEY("tenant_id","client_id","due_on")
);
--> statement-breakpoint
ALTER TABLE "cash_open_balances" ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE TABLE "cash_received_days" (
	"tenant_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"day" date NOT NULL,
	"amount" numeric(14, 2) NOT NULL,
	"count" integer NOT NULL,
	CONSTRAINT "cash_received_days_tenant_id_kind_day_pk" PRIMARY KEY("tenant_id","kind","day")
);
--> statement-breakpoint
ALTER TABLE "cash_received_days" ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE "cash_job_totals" ADD CONSTRAINT "cash_job_totals_tenant_id_firms_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."firms"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cash_open_balances" ADD CONSTRAINT "cash_open_balances_tenant_id_firms_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."firms"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cash_received_days" ADD CONSTRAINT "cash_received_days_tenant_id_firms_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."firms"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE POLICY "cash_job_totals_tenant_isolation" ON "cash_job_totals" AS PERMISSIVE FOR ALL TO public USING (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid) WITH CHECK (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid);--> statement-breakpoint
CREATE POLICY "cash_open_balances_tenant_isolation" ON "cash_open_balances" AS PERMISSIVE FOR ALL TO public USING (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid) WITH CHECK (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid);--> statement-breakpoint
CREATE POLICY "cash_received_days_tenant_isolation" ON "cash_received_days" AS PERMISSIVE FOR ALL TO public USING (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid) WITH CHECK (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid);