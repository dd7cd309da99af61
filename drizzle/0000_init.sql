CREATE TYPE "public"."email_status" AS ENUM('queued', 'sending', 'sent', 'failed', 'dead');--> statement-breakpoint
CREATE TYPE "public"."message_visibility" AS ENUM('internal', 'shared');--> statement-breakpoint
CREATE TYPE "public"."photo_status" AS ENUM('pending', 'stored', 'removed');--> statement-breakpoint
CREATE TYPE "public"."request_status" AS ENUM('draft', 'submitted', 'needs_details', 'visit_booked', 'checked', 'permit_filed', 'permit_granted', 'permit_refused', 'released', 'crew_assigned', 'under_construction', 'built', 'closed', 'declined', 'withdrawn');--> statement-breakpoint
CREATE TYPE "public"."role" AS ENUM('applicant', 'staff', 'crew', 'admin');--> statement-breakpoint
CREATE TYPE "public"."rule_profile_status" AS ENUM('draft', 'published');--> statement-breakpoint
CREATE TABLE "as_built_sets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"grade_check_id" uuid NOT NULL,
	"crew_id" uuid NOT NULL,
	"readings" jsonb NOT NULL,
	"results" jsonb NOT NULL,
	"passed" boolean NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "documents" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"grade_check_id" uuid,
	"kind" text NOT NULL,
	"title" text NOT NULL,
	"object_key" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"shared_with_applicant" boolean DEFAULT false NOT NULL,
	"created_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "documents_objectKey_unique" UNIQUE("object_key")
);
--> statement-breakpoint
CREATE TABLE "emails" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid,
	"event_id" bigint,
	"template" text NOT NULL,
	"to_address" text NOT NULL,
	"subject" text NOT NULL,
	"text_body" text NOT NULL,
	"html_body" text NOT NULL,
	"status" "email_status" DEFAULT 'queued' NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"message_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "grade_checks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"rule_profile_version_id" uuid NOT NULL,
	"engine_version" text NOT NULL,
	"inputs" jsonb NOT NULL,
	"results" jsonb NOT NULL,
	"passed" boolean NOT NULL,
	"summary" text NOT NULL,
	"attached_at" timestamp with time zone,
	"created_by_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "jobs" (
	"request_id" uuid PRIMARY KEY NOT NULL,
	"grade_check_id" uuid,
	"released_at" timestamp with time zone DEFAULT now() NOT NULL,
	"crew_id" uuid,
	"accepted_at" timestamp with time zone,
	"scheduled_for" date,
	"started_at" timestamp with time zone,
	"built_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "jurisdictions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"authority" text NOT NULL,
	"current_version_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "jurisdictions_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
CREATE TABLE "messages" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"author_id" uuid NOT NULL,
	"visibility" "message_visibility" DEFAULT 'shared' NOT NULL,
	"body" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"uploader_id" uuid NOT NULL,
	"object_key" text NOT NULL,
	"file_name" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"caption" text DEFAULT '' NOT NULL,
	"status" "photo_status" DEFAULT 'pending' NOT NULL,
	"gps_lat" double precision,
	"gps_lng" double precision,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"stored_at" timestamp with time zone,
	CONSTRAINT "photos_objectKey_unique" UNIQUE("object_key")
);
--> statement-breakpoint
CREATE TABLE "reference_counters" (
	"year" integer PRIMARY KEY NOT NULL,
	"last" integer DEFAULT 0 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "request_events" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"request_id" uuid NOT NULL,
	"actor_id" uuid,
	"kind" text DEFAULT 'transition' NOT NULL,
	"from_status" "request_status",
	"to_status" "request_status",
	"note" text DEFAULT '' NOT NULL,
	"internal" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "requests" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"reference" text NOT NULL,
	"applicant_id" uuid NOT NULL,
	"status" "request_status" DEFAULT 'draft' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"status_changed_at" timestamp with time zone DEFAULT now() NOT NULL,
	"jurisdiction_id" uuid,
	"assignee_id" uuid,
	"crew_id" uuid,
	"application" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"wizard_step" integer DEFAULT 0 NOT NULL,
	"applicant_name" text DEFAULT '' NOT NULL,
	"site_address" text DEFAULT '' NOT NULL,
	"road_name" text DEFAULT '' NOT NULL,
	"site_lat" double precision,
	"site_lng" double precision,
	"visit_at" timestamp with time zone,
	"permit_reference" text,
	"permit_decided_on" date,
	"permit_conditions" text,
	"permit_expires_on" date,
	"submitted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"search_vector" "tsvector" GENERATED ALWAYS AS (to_tsvector('simple', reference || ' ' || applicant_name || ' ' || site_address || ' ' || road_name)) STORED,
	CONSTRAINT "requests_reference_unique" UNIQUE("reference")
);
--> statement-breakpoint
CREATE TABLE "rule_profile_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"jurisdiction_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"status" "rule_profile_status" DEFAULT 'draft' NOT NULL,
	"profile" jsonb NOT NULL,
	"change_note" text DEFAULT '' NOT NULL,
	"created_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"published_at" timestamp with time zone,
	"published_by_id" uuid
);
--> statement-breakpoint
CREATE TABLE "session" (
	"sid" varchar PRIMARY KEY NOT NULL,
	"sess" jsonb NOT NULL,
	"expire" timestamp (6) NOT NULL
);
--> statement-breakpoint
CREATE TABLE "settings" (
	"key" text PRIMARY KEY NOT NULL,
	"value" jsonb NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"role" "role" DEFAULT 'applicant' NOT NULL,
	"google_sub" text,
	"disabled" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"last_sign_in_at" timestamp with time zone
);
--> statement-breakpoint
ALTER TABLE "as_built_sets" ADD CONSTRAINT "as_built_sets_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "as_built_sets" ADD CONSTRAINT "as_built_sets_grade_check_id_grade_checks_id_fk" FOREIGN KEY ("grade_check_id") REFERENCES "public"."grade_checks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "as_built_sets" ADD CONSTRAINT "as_built_sets_crew_id_users_id_fk" FOREIGN KEY ("crew_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "documents" ADD CONSTRAINT "documents_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "documents" ADD CONSTRAINT "documents_grade_check_id_grade_checks_id_fk" FOREIGN KEY ("grade_check_id") REFERENCES "public"."grade_checks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "documents" ADD CONSTRAINT "documents_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "emails" ADD CONSTRAINT "emails_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "grade_checks" ADD CONSTRAINT "grade_checks_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "grade_checks" ADD CONSTRAINT "grade_checks_rule_profile_version_id_rule_profile_versions_id_fk" FOREIGN KEY ("rule_profile_version_id") REFERENCES "public"."rule_profile_versions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "grade_checks" ADD CONSTRAINT "grade_checks_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_grade_check_id_grade_checks_id_fk" FOREIGN KEY ("grade_check_id") REFERENCES "public"."grade_checks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_crew_id_users_id_fk" FOREIGN KEY ("crew_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "messages" ADD CONSTRAINT "messages_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "messages" ADD CONSTRAINT "messages_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_uploader_id_users_id_fk" FOREIGN KEY ("uploader_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "request_events" ADD CONSTRAINT "request_events_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "request_events" ADD CONSTRAINT "request_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "requests" ADD CONSTRAINT "requests_applicant_id_users_id_fk" FOREIGN KEY ("applicant_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "requests" ADD CONSTRAINT "requests_jurisdiction_id_jurisdictions_id_fk" FOREIGN KEY ("jurisdiction_id") REFERENCES "public"."jurisdictions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "requests" ADD CONSTRAINT "requests_assignee_id_users_id_fk" FOREIGN KEY ("assignee_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "requests" ADD CONSTRAINT "requests_crew_id_users_id_fk" FOREIGN KEY ("crew_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rule_profile_versions" ADD CONSTRAINT "rule_profile_versions_jurisdiction_id_jurisdictions_id_fk" FOREIGN KEY ("jurisdiction_id") REFERENCES "public"."jurisdictions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rule_profile_versions" ADD CONSTRAINT "rule_profile_versions_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rule_profile_versions" ADD CONSTRAINT "rule_profile_versions_published_by_id_users_id_fk" FOREIGN KEY ("published_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "as_built_sets_request_idx" ON "as_built_sets" USING btree ("request_id","created_at");--> statement-breakpoint
CREATE INDEX "documents_request_idx" ON "documents" USING btree ("request_id");--> statement-breakpoint
CREATE INDEX "emails_status_idx" ON "emails" USING btree ("status","created_at");--> statement-breakpoint
CREATE INDEX "emails_request_idx" ON "emails" USING btree ("request_id");--> statement-breakpoint
CREATE UNIQUE INDEX "grade_checks_request_number_key" ON "grade_checks" USING btree ("request_id","number");--> statement-breakpoint
CREATE INDEX "jobs_crew_idx" ON "jobs" USING btree ("crew_id");--> statement-breakpoint
CREATE INDEX "messages_request_idx" ON "messages" USING btree ("request_id","created_at");--> statement-breakpoint
CREATE INDEX "photos_request_idx" ON "photos" USING btree ("request_id","status");--> statement-breakpoint
CREATE INDEX "request_events_request_idx" ON "request_events" USING btree ("request_id","created_at");--> statement-breakpoint
CREATE INDEX "requests_applicant_idx" ON "requests" USING btree ("applicant_id","updated_at");--> statement-breakpoint
CREATE INDEX "requests_status_changed_idx" ON "requests" USING btree ("status","status_changed_at","id");--> statement-breakpoint
CREATE INDEX "requests_status_changed_any_idx" ON "requests" USING btree ("status_changed_at","id");--> statement-breakpoint
CREATE INDEX "requests_jurisdiction_idx" ON "requests" USING btree ("jurisdiction_id","status_changed_at");--> statement-breakpoint
CREATE INDEX "requests_assignee_idx" ON "requests" USING btree ("assignee_id","status_changed_at");--> statement-breakpoint
CREATE INDEX "requests_crew_idx" ON "requests" USING btree ("crew_id","status");--> statement-breakpoint
CREATE INDEX "requests_created_idx" ON "requests" USING btree ("created_at","id");--> statement-breakpoint
CREATE INDEX "requests_search_idx" ON "requests" USING gin ("search_vector");--> statement-breakpoint
CREATE UNIQUE INDEX "rule_profile_versions_jurisdiction_version_key" ON "rule_profile_versions" USING btree ("jurisdiction_id","version");--> statement-breakpoint
CREATE INDEX "session_expire_idx" ON "session" USING btree ("expire");--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_key" ON "users" USING btree (lower("email"));--> statement-breakpoint
CREATE UNIQUE INDEX "users_google_sub_key" ON "users" USING btree ("google_sub");--> statement-breakpoint
CREATE INDEX "users_role_idx" ON "users" USING btree ("role");