CREATE TABLE "sign_in_throttle" (
	"key" text PRIMARY KEY NOT NULL,
	"tries" integer NOT NULL,
	"blocked_until" timestamp with time zone,
	"updated_at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "session_version" integer DEFAULT 1 NOT NULL;