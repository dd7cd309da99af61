ALTER TABLE "emails" ADD COLUMN "next_attempt_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
ALTER TABLE "emails" ADD COLUMN "lease_token" uuid;--> statement-breakpoint
ALTER TABLE "emails" ADD COLUMN "retry_until" timestamp with time zone;--> statement-breakpoint
CREATE INDEX "emails_due_idx" ON "emails" USING btree ("next_attempt_at") WHERE "emails"."status" in ('queued', 'failed', 'sending');