CREATE TABLE "rate_limit_counts" (
	"key" varchar(255) PRIMARY KEY NOT NULL,
	"points" integer DEFAULT 0 NOT NULL,
	"expire" bigint
);
--> statement-breakpoint
CREATE INDEX "rate_limit_counts_expire" ON "rate_limit_counts" USING btree ("expire");