ALTER TABLE `flights` ADD `meter_explanation` text;--> statement-breakpoint
ALTER TABLE `flights` ADD `gap_settled_at` integer;--> statement-breakpoint
ALTER TABLE `flights` ADD `gap_settled_by_id` text REFERENCES users(id);--> statement-breakpoint
ALTER TABLE `flights` ADD `gap_settled_note` text;--> statement-breakpoint
ALTER TABLE `flights` ADD `booking_id` text;--> statement-breakpoint
CREATE UNIQUE INDEX `flights_booking` ON `flights` (`club_id`,`booking_id`);--> statement-breakpoint
UPDATE `flights` SET `booking_id` = (SELECT b.`id` FROM `bookings` b WHERE b.`flight_id` = `flights`.`id` AND b.`club_id` = `flights`.`club_id` LIMIT 1);
