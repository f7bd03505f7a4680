ALTER TABLE `aircraft` ADD `tailwheel` integer DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `flights` ADD `day_full_stop_landings` integer;--> statement-breakpoint
ALTER TABLE `medical_certificates` ADD `verified_at` integer;--> statement-breakpoint
ALTER TABLE `medical_certificates` ADD `verified_by_id` text REFERENCES users(id);--> statement-breakpoint
ALTER TABLE `medical_certificates` ADD `verification_upload_id` text REFERENCES uploads(id);--> statement-breakpoint
ALTER TABLE `member_documents` ADD `verified_at` integer;--> statement-breakpoint
ALTER TABLE `member_documents` ADD `verified_by_id` text REFERENCES users(id);--> statement-breakpoint
ALTER TABLE `member_documents` ADD `verification_upload_id` text REFERENCES uploads(id);--> statement-breakpoint
ALTER TABLE `outside_flight_entries` ADD `category` text;--> statement-breakpoint
ALTER TABLE `outside_flight_entries` ADD `class_rating` text;--> statement-breakpoint
ALTER TABLE `outside_flight_entries` ADD `tailwheel` integer;--> statement-breakpoint
ALTER TABLE `outside_flight_entries` ADD `day_full_stop_landings` integer;--> statement-breakpoint
ALTER TABLE `outside_flight_entries` ADD `verified_at` integer;--> statement-breakpoint
ALTER TABLE `outside_flight_entries` ADD `verified_by_id` text REFERENCES users(id);--> statement-breakpoint
ALTER TABLE `outside_flight_entries` ADD `verification_upload_id` text REFERENCES uploads(id);--> statement-breakpoint
-- Claims and proof: a flight review or medical recorded by someone other than the member (an
-- instructor or officer) was entered on that person's authority and counts as verified by
-- them at the time it was recorded; one the member recorded about themselves stays a claim
-- until an instructor or the safety officer verifies it. Outside flights are always entered by
-- the member themselves, so every existing one is a claim.
UPDATE `member_documents` SET `verified_by_id` = `recorded_by_id`, `verified_at` = `created_at` WHERE `recorded_by_id` <> `user_id`;--> statement-breakpoint
UPDATE `medical_certificates` SET `verified_by_id` = `recorded_by_id`, `verified_at` = `created_at` WHERE `recorded_by_id` <> `user_id`;--> statement-breakpoint
-- The new booking guard for the flight review (14 CFR 61.56(c)) refuses by default in every
-- existing club, as it does in a new one; the home field position starts unknown.
UPDATE `clubs` SET `settings` = json_set(`settings`, '$.bookingGuards.flightReview', 'refuse') WHERE json_extract(`settings`, '$.bookingGuards.flightReview') IS NULL;--> statement-breakpoint
UPDATE `clubs` SET `settings` = json_set(`settings`, '$.homeLatitude', json('null'), '$.homeLongitude', json('null')) WHERE json_type(`settings`, '$.homeLatitude') IS NULL;
