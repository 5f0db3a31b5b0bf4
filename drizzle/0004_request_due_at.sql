DROP INDEX "change_requests_project_state_idx";--> statement-breakpoint
DROP INDEX "change_requests_state_idx";--> statement-breakpoint
ALTER TABLE "change_requests" ADD COLUMN "due_at" timestamp with time zone DEFAULT 'infinity'::timestamptz NOT NULL;--> statement-breakpoint
CREATE INDEX "change_requests_project_state_due_idx" ON "change_requests" USING btree ("project_id","state","due_at","id");--> statement-breakpoint
CREATE INDEX "change_requests_state_due_idx" ON "change_requests" USING btree ("state","due_at","id");--> statement-breakpoint
-- When a request falls due at the desk it sits at: the same rule as deskDueAt in
-- shared/requests/deskClock.ts (tests/api/requestDueAt.test.ts holds the two together): the
-- project's days for that desk, else the default, counted in whole 24-hour days from desk_since;
-- 'infinity' once the request is settled, so settled requests sort last and are never overdue.
CREATE FUNCTION change_request_due_at(request_state text, desk_since timestamptz, desk_due_days jsonb) RETURNS timestamptz
LANGUAGE sql IMMUTABLE AS $$
  SELECT CASE WHEN d.desk IS NULL THEN 'infinity'::timestamptz
    ELSE desk_since + make_interval(hours => 24 * coalesce((desk_due_days ->> d.desk)::int, d.default_days)) END
  FROM (SELECT
    CASE request_state
      WHEN 'drafting' THEN 'contractor' WHEN 'information_requested' THEN 'contractor' WHEN 'revising' THEN 'contractor'
      WHEN 'section_review' THEN 'section_engineer' WHEN 'central_routing' THEN 'central_office'
      WHEN 'eor_review' THEN 'engineer_of_record' WHEN 'conditions_open' THEN 'field_inspector'
    END AS desk,
    CASE request_state
      WHEN 'drafting' THEN 14 WHEN 'information_requested' THEN 14 WHEN 'revising' THEN 14
      WHEN 'section_review' THEN 5 WHEN 'central_routing' THEN 3
      WHEN 'eor_review' THEN 10 WHEN 'conditions_open' THEN 7
    END AS default_days) d
$$;
--> statement-breakpoint
CREATE FUNCTION change_requests_keep_due_at() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  NEW.due_at := change_request_due_at(NEW.state, NEW.desk_since, (SELECT p.desk_due_days FROM projects p WHERE p.id = NEW.project_id));
  RETURN NEW;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER change_requests_due_at
  BEFORE INSERT OR UPDATE OF state, desk_since, project_id ON change_requests
  FOR EACH ROW EXECUTE FUNCTION change_requests_keep_due_at();
--> statement-breakpoint
-- An administrator's new desk days move the due dates of the project's open requests.
CREATE FUNCTION projects_refresh_due_at() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE change_requests c SET due_at = change_request_due_at(c.state, c.desk_since, NEW.desk_due_days)
    WHERE c.project_id = NEW.id AND c.due_at <> 'infinity'::timestamptz;
  RETURN NULL;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER projects_desk_due_days
  AFTER UPDATE OF desk_due_days ON projects
  FOR EACH ROW WHEN (OLD.desk_due_days IS DISTINCT FROM NEW.desk_due_days)
  EXECUTE FUNCTION projects_refresh_due_at();
--> statement-breakpoint
UPDATE change_requests c SET due_at = change_request_due_at(c.state, c.desk_since, p.desk_due_days)
  FROM projects p WHERE p.id = c.project_id;
