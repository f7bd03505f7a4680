-- Safety records the database itself protects, whatever code runs against it.
-- A published bulletin is never edited (a revision is a new row) and never deleted.
CREATE TRIGGER bulletins_published_text_fixed
BEFORE UPDATE OF title, body_markdown, urgency, audience, audience_type_group, acknowledge_by, attachment_upload_id, version, series_id, supersedes_id, club_id ON bulletins
WHEN OLD.status = 'published'
BEGIN SELECT RAISE(ABORT, 'a published bulletin is never edited; issue a revision'); END;
--> statement-breakpoint
CREATE TRIGGER bulletins_published_stay_published BEFORE UPDATE OF status ON bulletins
WHEN OLD.status = 'published' AND NEW.status <> 'published'
BEGIN SELECT RAISE(ABORT, 'a published bulletin stays published'); END;
--> statement-breakpoint
CREATE TRIGGER bulletins_published_no_delete BEFORE DELETE ON bulletins
WHEN OLD.status = 'published'
BEGIN SELECT RAISE(ABORT, 'a published bulletin is never deleted'); END;
--> statement-breakpoint
CREATE TRIGGER bulletin_acknowledgements_no_update BEFORE UPDATE ON bulletin_acknowledgements
BEGIN SELECT RAISE(ABORT, 'acknowledgements are never changed'); END;
--> statement-breakpoint
CREATE TRIGGER bulletin_acknowledgements_no_delete BEFORE DELETE ON bulletin_acknowledgements
BEGIN SELECT RAISE(ABORT, 'acknowledgements are never deleted'); END;
--> statement-breakpoint
-- An anonymous report never carries a reporter: not on insert, not added later.
CREATE TRIGGER safety_reports_anonymous_insert BEFORE INSERT ON safety_reports
WHEN NEW.anonymous = 1 AND NEW.reporter_id IS NOT NULL
BEGIN SELECT RAISE(ABORT, 'an anonymous report stores no reporter'); END;
--> statement-breakpoint
CREATE TRIGGER safety_reports_anonymous_update BEFORE UPDATE OF reporter_id, anonymous ON safety_reports
WHEN (NEW.anonymous = 1 AND NEW.reporter_id IS NOT NULL) OR (OLD.anonymous = 1 AND NEW.anonymous = 0)
BEGIN SELECT RAISE(ABORT, 'an anonymous report stores no reporter'); END;
--> statement-breakpoint
CREATE TRIGGER safety_reports_no_delete BEFORE DELETE ON safety_reports
BEGIN SELECT RAISE(ABORT, 'safety reports are closed, never deleted'); END;
--> statement-breakpoint
CREATE TRIGGER safety_report_events_no_update BEFORE UPDATE ON safety_report_events
BEGIN SELECT RAISE(ABORT, 'safety report events are never changed'); END;
--> statement-breakpoint
CREATE TRIGGER safety_report_events_no_delete BEFORE DELETE ON safety_report_events
BEGIN SELECT RAISE(ABORT, 'safety report events are never deleted'); END;
