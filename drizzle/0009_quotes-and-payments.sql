CREATE TYPE "public"."checkout_status" AS ENUM('open', 'complete', 'expired');--> statement-breakpoint
CREATE TYPE "public"."payment_kind" AS ENUM('deposit', 'balance');--> statement-breakpoint
CREATE TYPE "public"."payment_method" AS ENUM('card', 'offline');--> statement-breakpoint
CREATE TYPE "public"."quote_status" AS ENUM('draft', 'sent', 'accepted', 'declined', 'replaced');--> statement-breakpoint
CREATE TYPE "public"."rate_card_status" AS ENUM('draft', 'published');--> statement-breakpoint
CREATE TABLE "balance_changes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"description" text NOT NULL,
	"amount_cents" bigint NOT NULL,
	"created_by_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payment_checkouts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"kind" "payment_kind" NOT NULL,
	"amount_cents" bigint NOT NULL,
	"currency" text NOT NULL,
	"status" "checkout_status" DEFAULT 'open' NOT NULL,
	"provider_session_id" text,
	"url" text,
	"created_by_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	CONSTRAINT "payment_checkouts_providerSessionId_unique" UNIQUE("provider_session_id")
);
--> statement-breakpoint
CREATE TABLE "payment_provider_events" (
	"event_id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"object_id" text,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"kind" "payment_kind" NOT NULL,
	"method" "payment_method" NOT NULL,
	"amount_cents" bigint NOT NULL,
	"currency" text NOT NULL,
	"quote_id" uuid,
	"checkout_id" uuid,
	"provider_session_id" text,
	"provider_payment_intent_id" text,
	"note" text DEFAULT '' NOT NULL,
	"recorded_by_id" uuid,
	"paid_at" timestamp with time zone NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"refunded_at" timestamp with time zone,
	"refunded_cents" bigint DEFAULT 0 NOT NULL,
	"provider_refund_id" text,
	"refund_note" text DEFAULT '' NOT NULL,
	"refunded_by_id" uuid,
	CONSTRAINT "payments_providerSessionId_unique" UNIQUE("provider_session_id")
);
--> statement-breakpoint
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
ALTER TABLE "balance_changes" ADD CONSTRAINT "balance_changes_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "balance_changes" ADD CONSTRAINT "balance_changes_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payment_checkouts" ADD CONSTRAINT "payment_checkouts_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payment_checkouts" ADD CONSTRAINT "payment_checkouts_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_quote_id_quotes_id_fk" FOREIGN KEY ("quote_id") REFERENCES "public"."quotes"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_checkout_id_payment_checkouts_id_fk" FOREIGN KEY ("checkout_id") REFERENCES "public"."payment_checkouts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_recorded_by_id_users_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_refunded_by_id_users_id_fk" FOREIGN KEY ("refunded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
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
CREATE INDEX "balance_changes_request_idx" ON "balance_changes" USING btree ("request_id");--> statement-breakpoint
CREATE UNIQUE INDEX "payment_checkouts_one_open_key" ON "payment_checkouts" USING btree ("request_id","kind") WHERE "payment_checkouts"."status" = 'open';--> statement-breakpoint
CREATE UNIQUE INDEX "payments_request_kind_key" ON "payments" USING btree ("request_id","kind");--> statement-breakpoint
CREATE INDEX "payments_paid_idx" ON "payments" USING btree ("paid_at");--> statement-breakpoint
CREATE UNIQUE INDEX "quotes_request_version_key" ON "quotes" USING btree ("request_id","version");--> statement-breakpoint
CREATE UNIQUE INDEX "quotes_request_one_draft_key" ON "quotes" USING btree ("request_id") WHERE "quotes"."status" = 'draft';--> statement-breakpoint
CREATE UNIQUE INDEX "rate_card_versions_version_key" ON "rate_card_versions" USING btree ("version");--> statement-breakpoint
CREATE UNIQUE INDEX "rate_card_versions_one_draft_key" ON "rate_card_versions" USING btree ("status") WHERE "rate_card_versions"."status" = 'draft';