CREATE TABLE "rate_limits" (
	"key" varchar(255) PRIMARY KEY NOT NULL,
	"points" integer DEFAULT 0 NOT NULL,
	"expire" timestamp with time zone
);
--> statement-breakpoint
CREATE INDEX "rate_limits_expire_idx" ON "rate_limits" USING btree ("expire");--> statement-breakpoint
CREATE INDEX "photos_pending_idx" ON "photos" USING btree ("created_at") WHERE "photos"."status" = 'pending';