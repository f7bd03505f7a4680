-- Club data version: counters per club, bumped in the same transaction by every write to a
-- table the club's cached reads depend on, by triggers, so that no write path can forget it.
-- `version` counts what the flight line, the due lists and the club's people read: aircraft,
-- flights, inspection items and completions, squawks, grounding notices, memberships and the
-- club row itself (time zone, settings). `bookings_version` counts bookings apart: they change
-- far more often and the flight line never reads them, so a booking leaves its snapshot valid.
-- Readers compare the version (one primary-key read) with the one their snapshot was built at.
CREATE TABLE `club_data_version` (
	`club_id` text PRIMARY KEY NOT NULL,
	`version` integer NOT NULL DEFAULT 0,
	`bookings_version` integer NOT NULL DEFAULT 0
) WITHOUT ROWID;
--> statement-breakpoint
INSERT INTO `club_data_version` (`club_id`, `version`, `bookings_version`) SELECT `id`, 1, 1 FROM `clubs`;
--> statement-breakpoint
CREATE TRIGGER `aircraft_bump_club_version_insert` AFTER INSERT ON `aircraft`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `aircraft_bump_club_version_update` AFTER UPDATE ON `aircraft`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `aircraft_bump_club_version_delete` AFTER DELETE ON `aircraft`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (OLD.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `flights_bump_club_version_insert` AFTER INSERT ON `flights`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `flights_bump_club_version_update` AFTER UPDATE ON `flights`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `flights_bump_club_version_delete` AFTER DELETE ON `flights`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (OLD.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `inspection_items_bump_club_version_insert` AFTER INSERT ON `inspection_items`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `inspection_items_bump_club_version_update` AFTER UPDATE ON `inspection_items`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `inspection_items_bump_club_version_delete` AFTER DELETE ON `inspection_items`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (OLD.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `inspection_completions_bump_club_version_insert` AFTER INSERT ON `inspection_completions`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `inspection_completions_bump_club_version_update` AFTER UPDATE ON `inspection_completions`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `inspection_completions_bump_club_version_delete` AFTER DELETE ON `inspection_completions`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (OLD.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `squawks_bump_club_version_insert` AFTER INSERT ON `squawks`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `squawks_bump_club_version_update` AFTER UPDATE ON `squawks`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `squawks_bump_club_version_delete` AFTER DELETE ON `squawks`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (OLD.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `grounding_notices_bump_club_version_insert` AFTER INSERT ON `grounding_notices`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `grounding_notices_bump_club_version_update` AFTER UPDATE ON `grounding_notices`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `grounding_notices_bump_club_version_delete` AFTER DELETE ON `grounding_notices`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (OLD.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `memberships_bump_club_version_insert` AFTER INSERT ON `memberships`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `memberships_bump_club_version_update` AFTER UPDATE ON `memberships`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `memberships_bump_club_version_delete` AFTER DELETE ON `memberships`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (OLD.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `bookings_bump_club_version_insert` AFTER INSERT ON `bookings`
BEGIN
  INSERT INTO club_data_version (club_id, bookings_version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET bookings_version = bookings_version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `bookings_bump_club_version_update` AFTER UPDATE ON `bookings`
BEGIN
  INSERT INTO club_data_version (club_id, bookings_version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET bookings_version = bookings_version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `bookings_bump_club_version_delete` AFTER DELETE ON `bookings`
BEGIN
  INSERT INTO club_data_version (club_id, bookings_version) VALUES (OLD.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET bookings_version = bookings_version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `clubs_bump_club_version_update` AFTER UPDATE ON `clubs`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
-- Status from what matters: one aircraft's items' completions, newest first (the latest
-- completion of a calendar item, the whole chain of an hours item), without walking the club.
CREATE INDEX `inspection_completions_aircraft_item` ON `inspection_completions` (`aircraft_id`, `item_id`, `done_on`, `hours`);
