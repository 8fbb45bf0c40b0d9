ALTER TABLE "users" DROP COLUMN "failed_sign_ins";--> statement-breakpoint
ALTER TABLE "users" DROP COLUMN "locked_until";