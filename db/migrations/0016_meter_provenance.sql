CREATE TABLE `meter_conversions` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`aircraft_id` text NOT NULL,
	`completion_id` text,
	`from_meter` text NOT NULL,
	`from_reading` real,
	`to_meter` text NOT NULL,
	`to_reading` real NOT NULL,
	`note` text,
	`recorded_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`completion_id`) REFERENCES `inspection_completions`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recorded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `meter_conversions_club_id` ON `meter_conversions` (`club_id`,`aircraft_id`);--> statement-breakpoint
ALTER TABLE `inspection_completions` ADD `meter` text;--> statement-breakpoint
-- Existing completions get the meter their aircraft's inspections count by now: no switch was
-- ever recorded before this migration, so that is the meter they were read on. The append-only
-- trigger steps aside for this one backfill and is put back unchanged.
DROP TRIGGER `inspection_completions_no_update`;
--> statement-breakpoint
UPDATE `inspection_completions` SET `meter` = (SELECT `maintenance_meter` FROM `aircraft` WHERE `aircraft`.`id` = `inspection_completions`.`aircraft_id`) WHERE `meter` IS NULL;
--> statement-breakpoint
CREATE TRIGGER inspection_completions_no_update BEFORE UPDATE ON inspection_completions
BEGIN SELECT RAISE(ABORT, 'inspection_completions rows are never updated'); END;
--> statement-breakpoint
CREATE TRIGGER meter_conversions_no_update BEFORE UPDATE ON meter_conversions
BEGIN SELECT RAISE(ABORT, 'meter_conversions rows are never updated'); END;
--> statement-breakpoint
CREATE TRIGGER meter_conversions_no_delete BEFORE DELETE ON meter_conversions
BEGIN SELECT RAISE(ABORT, 'meter_conversions rows are never deleted'); END;
--> statement-breakpoint
CREATE TRIGGER meter_conversions_no_replace BEFORE INSERT ON meter_conversions
WHEN EXISTS (SELECT 1 FROM meter_conversions WHERE id = NEW.id)
BEGIN SELECT RAISE(ABORT, 'meter_conversions rows are never replaced'); END;
