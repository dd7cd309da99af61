-- The office queue keeps recently built pages in each app process. Every change that can alter a queue row is
-- announced on the channel "queue_changed", which PostgreSQL delivers to listeners only once the change commits.
-- Drafts are never in the queue, so a draft's own edits stay silent.
CREATE FUNCTION "announce_queue_change"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM pg_notify('queue_changed', '');
  RETURN NULL;
END
$$;--> statement-breakpoint
CREATE TRIGGER "requests_queue_insert" AFTER INSERT ON "requests"
  FOR EACH ROW WHEN (NEW."status" <> 'draft') EXECUTE FUNCTION "announce_queue_change"();--> statement-breakpoint
CREATE TRIGGER "requests_queue_update"
  AFTER UPDATE OF "reference", "status", "status_changed_at", "jurisdiction_id", "assignee_id", "applicant_name",
    "site_address", "road_name", "created_at" ON "requests"
  FOR EACH ROW WHEN (OLD."status" <> 'draft' OR NEW."status" <> 'draft') EXECUTE FUNCTION "announce_queue_change"();--> statement-breakpoint
CREATE TRIGGER "requests_queue_delete" AFTER DELETE ON "requests"
  FOR EACH ROW WHEN (OLD."status" <> 'draft') EXECUTE FUNCTION "announce_queue_change"();--> statement-breakpoint
CREATE TRIGGER "requests_queue_truncate" AFTER TRUNCATE ON "requests"
  FOR EACH STATEMENT EXECUTE FUNCTION "announce_queue_change"();--> statement-breakpoint
-- A row shows its authority's name and its assignee's name.
CREATE TRIGGER "jurisdictions_queue_names" AFTER UPDATE OF "name" OR DELETE OR TRUNCATE ON "jurisdictions"
  FOR EACH STATEMENT EXECUTE FUNCTION "announce_queue_change"();--> statement-breakpoint
CREATE TRIGGER "users_queue_names" AFTER UPDATE OF "name" OR DELETE OR TRUNCATE ON "users"
  FOR EACH STATEMENT EXECUTE FUNCTION "announce_queue_change"();
