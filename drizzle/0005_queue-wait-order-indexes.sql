DROP INDEX "requests_status_changed_any_idx";--> statement-breakpoint
ALTER TABLE "requests" ADD COLUMN "ended" boolean GENERATED ALWAYS AS (status in ('closed', 'declined', 'withdrawn', 'permit_refused')) STORED NOT NULL;--> statement-breakpoint
CREATE INDEX "requests_waiting_idx" ON "requests" USING btree ("ended","status_changed_at","id");--> statement-breakpoint
CREATE INDEX "requests_waiting_newest_idx" ON "requests" USING btree ((not "ended"),"status_changed_at","id");--> statement-breakpoint
CREATE INDEX "requests_jurisdiction_status_applicant_idx" ON "requests" USING btree ("jurisdiction_id","status","applicant_name","id");