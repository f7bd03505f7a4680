-- Weekly series: the bookings made together by one weekly (recurring) booking share a series id,
-- so that the later weeks can be cancelled or moved together. Single bookings keep it null.
-- Bookings already bump `bookings_version` on every update and insert (0018), so no new trigger.
ALTER TABLE `bookings` ADD `series_id` text;
--> statement-breakpoint
CREATE INDEX `bookings_series` ON `bookings` (`club_id`,`series_id`,`starts_at`);
