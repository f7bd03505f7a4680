-- Append-only history stays append-only whatever SQL runs against it.
-- INSERT OR REPLACE / REPLACE INTO resolve a key conflict by deleting the old row, and SQLite
-- fires no DELETE trigger for that unless recursive_triggers is on; an UPSERT's DO UPDATE is
-- caught by the UPDATE triggers, but only after the insert was attempted. A BEFORE INSERT trigger
-- that refuses a row whose key (primary or unique) is already taken closes every one of these
-- ways, on every connection. (A new row with a fresh key is still an ordinary insert.)
CREATE TRIGGER audit_log_no_replace BEFORE INSERT ON audit_log
WHEN EXISTS (SELECT 1 FROM audit_log WHERE id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'audit_log rows are never replaced'); END;
--> statement-breakpoint
CREATE TRIGGER journal_entries_no_replace BEFORE INSERT ON journal_entries
WHEN EXISTS (SELECT 1 FROM journal_entries WHERE id = NEW.id OR (club_id = NEW.club_id AND source_key = NEW.source_key) OR reverses_entry_id = NEW.reverses_entry_id)
BEGIN SELECT RAISE(ABORT, 'journal entries are never replaced; post a reversing entry'); END;
--> statement-breakpoint
CREATE TRIGGER journal_lines_no_replace BEFORE INSERT ON journal_lines
WHEN EXISTS (SELECT 1 FROM journal_lines WHERE id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'journal lines are never replaced; post a reversing entry'); END;
--> statement-breakpoint
CREATE TRIGGER squawk_events_no_replace BEFORE INSERT ON squawk_events
WHEN EXISTS (SELECT 1 FROM squawk_events WHERE id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'squawk_events rows are never replaced'); END;
--> statement-breakpoint
CREATE TRIGGER inspection_completions_no_replace BEFORE INSERT ON inspection_completions
WHEN EXISTS (SELECT 1 FROM inspection_completions WHERE id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'inspection_completions rows are never replaced'); END;
--> statement-breakpoint
CREATE TRIGGER squawks_no_replace BEFORE INSERT ON squawks
WHEN EXISTS (SELECT 1 FROM squawks WHERE id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'squawks are closed, never replaced'); END;
--> statement-breakpoint
CREATE TRIGGER grounding_notices_no_replace BEFORE INSERT ON grounding_notices
WHEN EXISTS (SELECT 1 FROM grounding_notices WHERE id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'grounding notices are lifted, never replaced'); END;
--> statement-breakpoint
CREATE TRIGGER inspection_items_no_replace BEFORE INSERT ON inspection_items
WHEN EXISTS (SELECT 1 FROM inspection_items WHERE id = NEW.id OR (aircraft_id = NEW.aircraft_id AND key = NEW.key))
BEGIN SELECT RAISE(ABORT, 'inspection items are retired, never replaced'); END;
--> statement-breakpoint
CREATE TRIGGER flights_no_replace BEFORE INSERT ON flights
WHEN EXISTS (SELECT 1 FROM flights WHERE id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'flights are never replaced'); END;
--> statement-breakpoint
CREATE TRIGGER bulletins_no_replace BEFORE INSERT ON bulletins
WHEN EXISTS (SELECT 1 FROM bulletins WHERE status = 'published' AND (id = NEW.id OR (series_id = NEW.series_id AND version = NEW.version)))
BEGIN SELECT RAISE(ABORT, 'a published bulletin is never replaced; issue a revision'); END;
--> statement-breakpoint
CREATE TRIGGER bulletin_acknowledgements_no_replace BEFORE INSERT ON bulletin_acknowledgements
WHEN EXISTS (SELECT 1 FROM bulletin_acknowledgements WHERE id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'acknowledgements are never replaced'); END;
--> statement-breakpoint
CREATE TRIGGER safety_reports_no_replace BEFORE INSERT ON safety_reports
WHEN EXISTS (SELECT 1 FROM safety_reports WHERE id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'safety reports are closed, never replaced'); END;
--> statement-breakpoint
CREATE TRIGGER safety_report_events_no_replace BEFORE INSERT ON safety_report_events
WHEN EXISTS (SELECT 1 FROM safety_report_events WHERE id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'safety report events are never replaced'); END;
--> statement-breakpoint
-- Acknowledging a bulletin twice is answered by ON CONFLICT DO NOTHING in the app; the second
-- acknowledgement of the same person is skipped (never replaces the first, whose time stands).
CREATE TRIGGER bulletin_acknowledgements_once_kept BEFORE INSERT ON bulletin_acknowledgements
WHEN EXISTS (SELECT 1 FROM bulletin_acknowledgements WHERE bulletin_id = NEW.bulletin_id AND user_id = NEW.user_id AND id <> NEW.id)
BEGIN SELECT RAISE(IGNORE); END;
