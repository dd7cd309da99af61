ALTER TABLE "as_built_sets" ADD COLUMN "idempotency_key" uuid;--> statement-breakpoint
ALTER TABLE "as_built_sets" ADD COLUMN "idempotency_digest" text;--> statement-breakpoint
CREATE UNIQUE INDEX "as_built_sets_crew_idempotency_key" ON "as_built_sets" USING btree ("crew_id","idempotency_key");