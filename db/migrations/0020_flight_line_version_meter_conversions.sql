-- The flight line's snapshot (club_data_version, 0018) also depends on meter_conversions (0016):
-- maintenance's reading of a completion on the new meter makes an item computable again, so
-- every write to it bumps the club's version in the same transaction, like the other fleet tables.
-- (This migration's snapshot also brings drizzle-kit's record up to the schema after 0016-0019.)
CREATE TRIGGER `meter_conversions_bump_club_version_insert` AFTER INSERT ON `meter_conversions`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `meter_conversions_bump_club_version_update` AFTER UPDATE ON `meter_conversions`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `meter_conversions_bump_club_version_delete` AFTER DELETE ON `meter_conversions`
BEGIN
  INSERT INTO club_data_version (club_id, version) VALUES (OLD.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1;
END;
