CREATE TABLE "used_form_stamps" (
	"nonce" text PRIMARY KEY NOT NULL,
	"used_at" timestamp with time zone DEFAULT now() NOT NULL
);
