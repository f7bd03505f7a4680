-- The schedule beside the bookings: maintenance blocks on an aircraft (set by maintenance, a
-- span with a reason; the booking guard refuses a booking over one), the windows an instructor
-- is available, and the day-before reminders already queued (one per booking and start).
-- Blocks and availability change what the booking page shows, so every write bumps the club's
-- bookings_version like bookings do (0018); a block also bumps `version` for the flight line.
CREATE TABLE `maintenance_blocks` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL REFERENCES `clubs`(`id`),
	`aircraft_id` text NOT NULL REFERENCES `aircraft`(`id`),
	`starts_at` integer NOT NULL,
	`ends_at` integer NOT NULL,
	`reason` text NOT NULL,
	`created_by_id` text REFERENCES `users`(`id`),
	`removed_at` integer,
	`removed_by_id` text REFERENCES `users`(`id`),
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	CONSTRAINT "maintenance_blocks_window" CHECK("maintenance_blocks"."ends_at" > "maintenance_blocks"."starts_at")
);
--> statement-breakpoint
CREATE INDEX `maintenance_blocks_club_id` ON `maintenance_blocks` (`club_id`);
--> statement-breakpoint
CREATE INDEX `maintenance_blocks_aircraft_time` ON `maintenance_blocks` (`club_id`,`aircraft_id`,`starts_at`);
--> statement-breakpoint
CREATE TABLE `instructor_availability` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL REFERENCES `clubs`(`id`),
	`user_id` text NOT NULL REFERENCES `users`(`id`),
	`starts_at` integer NOT NULL,
	`ends_at` integer NOT NULL,
	`removed_at` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	CONSTRAINT "instructor_availability_window" CHECK("instructor_availability"."ends_at" > "instructor_availability"."starts_at")
);
--> statement-breakpoint
CREATE INDEX `instructor_availability_club_id` ON `instructor_availability` (`club_id`);
--> statement-breakpoint
CREATE INDEX `instructor_availability_user_time` ON `instructor_availability` (`club_id`,`user_id`,`starts_at`);
--> statement-breakpoint
CREATE TABLE `booking_reminders` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL REFERENCES `clubs`(`id`),
	`booking_id` text NOT NULL REFERENCES `bookings`(`id`),
	`starts_at` integer NOT NULL,
	`outbox_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL
);
--> statement-breakpoint
CREATE INDEX `booking_reminders_club_id` ON `booking_reminders` (`club_id`);
--> statement-breakpoint
CREATE UNIQUE INDEX `booking_reminders_once` ON `booking_reminders` (`booking_id`,`starts_at`);
--> statement-breakpoint
CREATE TRIGGER `maintenance_blocks_bump_club_version_insert` AFTER INSERT ON `maintenance_blocks`
BEGIN
  INSERT INTO club_data_version (club_id, version, bookings_version) VALUES (NEW.club_id, 1, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1, bookings_version = bookings_version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `maintenance_blocks_bump_club_version_update` AFTER UPDATE ON `maintenance_blocks`
BEGIN
  INSERT INTO club_data_version (club_id, version, bookings_version) VALUES (NEW.club_id, 1, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1, bookings_version = bookings_version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `maintenance_blocks_bump_club_version_delete` AFTER DELETE ON `maintenance_blocks`
BEGIN
  INSERT INTO club_data_version (club_id, version, bookings_version) VALUES (OLD.club_id, 1, 1)
    ON CONFLICT (club_id) DO UPDATE SET version = version + 1, bookings_version = bookings_version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `instructor_availability_bump_club_version_insert` AFTER INSERT ON `instructor_availability`
BEGIN
  INSERT INTO club_data_version (club_id, bookings_version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET bookings_version = bookings_version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `instructor_availability_bump_club_version_update` AFTER UPDATE ON `instructor_availability`
BEGIN
  INSERT INTO club_data_version (club_id, bookings_version) VALUES (NEW.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET bookings_version = bookings_version + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `instructor_availability_bump_club_version_delete` AFTER DELETE ON `instructor_availability`
BEGIN
  INSERT INTO club_data_version (club_id, bookings_version) VALUES (OLD.club_id, 1)
    ON CONFLICT (club_id) DO UPDATE SET bookings_version = bookings_version + 1;
END;
