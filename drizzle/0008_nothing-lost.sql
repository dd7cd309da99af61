CREATE TABLE "grade_check_drafts" (
	"request_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"survey" jsonb NOT NULL,
	"rule_profile_version_id" uuid,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "grade_check_drafts_request_id_user_id_pk" PRIMARY KEY("request_id","user_id")
);
--> statement-breakpoint
ALTER TABLE "as_built_sets" ADD COLUMN "replaces_set_id" uuid;--> statement-breakpoint
ALTER TABLE "emails" ADD COLUMN "attachments" jsonb DEFAULT '[]'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "jobs" ADD COLUMN "work_day_sequence" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "requests" ADD COLUMN "visit_sequence" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "grade_check_drafts" ADD CONSTRAINT "grade_check_drafts_request_id_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "grade_check_drafts" ADD CONSTRAINT "grade_check_drafts_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "grade_check_drafts" ADD CONSTRAINT "grade_check_drafts_rule_profile_version_id_rule_profile_versions_id_fk" FOREIGN KEY ("rule_profile_version_id") REFERENCES "public"."rule_profile_versions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "as_built_sets" ADD CONSTRAINT "as_built_sets_replaces_set_id_as_built_sets_id_fk" FOREIGN KEY ("replaces_set_id") REFERENCES "public"."as_built_sets"("id") ON DELETE no action ON UPDATE no action;