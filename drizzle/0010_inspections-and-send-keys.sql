CREATE TABLE "inspections" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"passed" boolean NOT NULL,
	"inspector_name" text NOT NULL,
	"items" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"link_id" uuid,
	"recorded_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "inspector_links" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"inspector_name" text NOT NULL,
	"inspector_email" text NOT NULL,
	"created_by_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"revoked_at" timestamp with time zone,
	"revoked_by_id" uuid,
	"last_opened_at" timestamp with time zone,
	"outcome_at" timestamp with time zone,
	CONSTRAINT "inspector_links_tokenHash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
ALTER TABLE "as_built_sets" ADD COLUMN "idempotency_key" uuid;--> statement-breakpoint
ALTER TABLE "as_built_sets" ADD COLUMN "idempotency_digest" text;--> statement-breakpoint
ALTER TABLE "photos" ADD COLUMN "kind" text;--> statement-breakpoint
ALTER TABLE "photos" ADD COLUMN "idempotency_key" uuid;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_link_id_inspector_links_id_fk" FOREIGN KEY ("link_id") REFERENCES "public"."inspector_links"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_recorded_by_id_users_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspector_links" ADD CONSTRAINT "inspector_links_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspector_links" ADD CONSTRAINT "inspector_links_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspector_links" ADD CONSTRAINT "inspector_links_revoked_by_id_users_id_fk" FOREIGN KEY ("revoked_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "inspections_request_idx" ON "inspections" USING btree ("request_id","created_at");--> statement-breakpoint
CREATE INDEX "inspector_links_request_idx" ON "inspector_links" USING btree ("request_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "as_built_sets_crew_idempotency_key" ON "as_built_sets" USING btree ("crew_id","idempotency_key");--> statement-breakpoint
CREATE UNIQUE INDEX "photos_request_idempotency_key" ON "photos" USING btree ("request_id","idempotency_key");