ALTER TABLE "mail_outbox" ADD COLUMN "from_name" text;--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD COLUMN "reply_to" text;