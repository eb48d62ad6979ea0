CREATE TABLE "cash_open_clients" (
	"tenant_id" uuid NOT NULL,
	"client_id" uuid NOT NULL,
	"owed" numeric(14, 2) NOT NULL,
	"invoice_count" integer NOT NULL,
	CONSTRAINT "cash_open_clients_tenant_id_client_id_pk" PRIMARY KEY("tenant_id","client_id")
);
--> statement-breakpoint
ALTER TABLE "cash_open_clients" ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE TABLE "cash_open_due_days" (
	"tenant_id" uuid NOT NULL,
	"due_on" date NOT NULL,
	"owed" numeric(14, 2) NOT NULL,
	"invoice_count" integer NOT NULL,
	CONSTRAINT "cash_open_due_days_tenant_id_due_on_pk" PRIMARY KEY("tenant_id","due_on")
);
--> statement-breakpoint
ALTER TABLE "cash_open_due_days" ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE "cash_open_clients" ADD CONSTRAINT "cash_open_clients_tenant_id_firms_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."firms"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cash_open_due_days" ADD CONSTRAINT "cash_open_due_days_tenant_id_firms_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."firms"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE POLICY "cash_open_clients_tenant_isolation" ON "cash_open_clients" AS PERMISSIVE FOR ALL TO public USING (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid) WITH CHECK (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid);--> statement-breakpoint
CREATE POLICY "cash_open_due_days_tenant_isolation" ON "cash_open_due_days" AS PERMISSIVE FOR ALL TO public USING (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid) WITH CHECK (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid);