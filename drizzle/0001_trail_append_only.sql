-- The decision trail is append-only: nothing may change or remove a row once written.
CREATE FUNCTION trail_events_refuse_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'trail_events is append-only: % refused', TG_OP USING ERRCODE = 'insufficient_privilege';
END;
$$;
--> statement-breakpoint
CREATE TRIGGER trail_events_append_only
  BEFORE UPDATE OR DELETE ON trail_events
  FOR EACH ROW EXECUTE FUNCTION trail_events_refuse_change();
--> statement-breakpoint
CREATE TRIGGER trail_events_no_truncate
  BEFORE TRUNCATE ON trail_events
  FOR EACH STATEMENT EXECUTE FUNCTION trail_events_refuse_change();
