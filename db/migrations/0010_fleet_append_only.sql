-- Fleet records are never deleted: squawks are closed, notices lifted, items retired. Every
-- squawk transition and every inspection completion is a permanent entry.
CREATE TRIGGER squawk_events_no_update BEFORE UPDATE ON squawk_events
BEGIN SELECT RAISE(ABORT, 'squawk_events rows are never updated'); END;
--> statement-breakpoint
CREATE TRIGGER squawk_events_no_delete BEFORE DELETE ON squawk_events
BEGIN SELECT RAISE(ABORT, 'squawk_events rows are never deleted'); END;
--> statement-breakpoint
CREATE TRIGGER inspection_completions_no_update BEFORE UPDATE ON inspection_completions
BEGIN SELECT RAISE(ABORT, 'inspection_completions rows are never updated'); END;
--> statement-breakpoint
CREATE TRIGGER inspection_completions_no_delete BEFORE DELETE ON inspection_completions
BEGIN SELECT RAISE(ABORT, 'inspection_completions rows are never deleted'); END;
--> statement-breakpoint
CREATE TRIGGER squawks_no_delete BEFORE DELETE ON squawks
BEGIN SELECT RAISE(ABORT, 'squawks are closed, never deleted'); END;
--> statement-breakpoint
CREATE TRIGGER grounding_notices_no_delete BEFORE DELETE ON grounding_notices
BEGIN SELECT RAISE(ABORT, 'grounding notices are lifted, never deleted'); END;
--> statement-breakpoint
CREATE TRIGGER inspection_items_no_delete BEFORE DELETE ON inspection_items
BEGIN SELECT RAISE(ABORT, 'inspection items are retired, never deleted'); END;
--> statement-breakpoint
CREATE TRIGGER flights_no_delete BEFORE DELETE ON flights
BEGIN SELECT RAISE(ABORT, 'flights are never deleted'); END;
