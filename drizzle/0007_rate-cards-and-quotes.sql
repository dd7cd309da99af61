CREATE TYPE "public"."quote_status" AS ENUM('draft', 'sent', 'accepted', 'declined', 'replaced');--> statement-breakpoint
CREATE TYPE "public"."rate_card_status" AS ENUM('draft', 'published');--> statement-breakpoint
CREATE TABLE "quotes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"status" "quote_status" DEFAULT 'draft' NOT NULL,
	"grade_check_id" uuid NOT NULL,
	"rate_card_version_id" uuid NOT NULL,
	"lines" jsonb NOT NULL,
	"subtotal_cents" bigint NOT NULL,
	"tax_cents" bigint NOT NULL,
	"total_cents" bigint NOT NULL,
	"tax_rate_bp" integer NOT NULL,
	"deposit_rate_bp" integer NOT NULL,
	"deposit_cents" bigint NOT NULL,
	"terms" text DEFAULT '' NOT NULL,
	"valid_until" date NOT NULL,
	"document_id" uuid,
	"created_by_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone,
	"sent_by_id" uuid,
	"accepted_at" timestamp with time zone,
	"accepted_name" text,
	"accepted_by_id" uuid,
	"declined_at" timestamp with time zone,
	"decline_reason" text,
	"declined_by_id" uuid
);
--> statement-breakpoint
CREATE TABLE "rate_card_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"version" integer NOT NULL,
	"status" "rate_card_status" DEFAULT 'draft' NOT NULL,
	"prices" jsonb NOT NULL,
	"change_note" text DEFAULT '' NOT NULL,
	"created_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"published_at" timestamp with time zone,
	"published_by_id" uuid
);
--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_grade_check_id_grade_checks_id_fk" FOREIGN KEY ("grade_check_id") REFERENCES "public"."grade_checks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_rate_card_version_id_rate_card_versions_id_fk" FOREIGN KEY ("rate_card_version_id") REFERENCES "public"."rate_card_versions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_document_id_documents_id_fk" FOREIGN KEY ("document_id") REFERENCES "public"."documents"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_sent_by_id_users_id_fk" FOREIGN KEY ("sent_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_accepted_by_id_users_id_fk" FOREIGN KEY ("accepted_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_declined_by_id_users_id_fk" FOREIGN KEY ("declined_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rate_card_versions" ADD CONSTRAINT "rate_card_versions_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rate_card_versions" ADD CONSTRAINT "rate_card_versions_published_by_id_users_id_fk" FOREIGN KEY ("published_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "quotes_request_version_key" ON "quotes" USING btree ("request_id","version");--> statement-breakpoint
CREATE UNIQUE INDEX "quotes_request_one_draft_key" ON "quotes" USING btree ("request_id") WHERE "quotes"."status" = 'draft';--> statement-breakpoint
CREATE UNIQUE INDEX "rate_card_versions_version_key" ON "rate_card_versions" USING btree ("version");--> statement-breakpoint
CREATE UNIQUE INDEX "rate_card_versions_one_draft_key" ON "rate_card_versions" USING btree ("status") WHERE "rate_card_versions"."status" = 'draft';