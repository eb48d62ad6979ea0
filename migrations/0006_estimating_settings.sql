CREATE TABLE "firm_estimating_settings" (
	"tenant_id" uuid PRIMARY KEY NOT NULL,
	"settings" jsonb NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "firm_estimating_settings" ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE "firm_estimating_settings" ADD CONSTRAINT "firm_estimating_settings_tenant_id_firms_id_fk" FOREIGN KEY ("tenant_id") REFERENCES "public"."firms"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE POLICY "firm_estimating_settings_tenant_isolation" ON "firm_estimating_settings" AS PERMISSIVE FOR ALL TO public USING (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid) WITH CHECK (tenant_id = nullif(current_setting('app.tenant_id', true), '')::uuid);