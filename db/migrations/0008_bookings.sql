CREATE TABLE `booking_loadings` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`booking_id` text NOT NULL,
	`profile_id` text NOT NULL,
	`category` text DEFAULT 'normal' NOT NULL,
	`station_weights` text NOT NULL,
	`fuel_volumes` text NOT NULL,
	`burn_volume` real NOT NULL,
	`takeoff` text NOT NULL,
	`landing` text NOT NULL,
	`problems` text NOT NULL,
	`saved_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`booking_id`) REFERENCES `bookings`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`profile_id`) REFERENCES `weight_balance_profiles`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`saved_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `booking_loadings_club_id` ON `booking_loadings` (`club_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `booking_loadings_booking` ON `booking_loadings` (`booking_id`);--> statement-breakpoint
CREATE TABLE `bookings` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`aircraft_id` text NOT NULL,
	`user_id` text NOT NULL,
	`instructor_user_id` text,
	`starts_at` integer NOT NULL,
	`ends_at` integer NOT NULL,
	`status` text DEFAULT 'reserved' NOT NULL,
	`purpose` text,
	`carrying_passengers` integer DEFAULT false NOT NULL,
	`accepted_warnings` text DEFAULT '[]' NOT NULL,
	`cancelled_at` integer,
	`cancelled_by_id` text,
	`cancel_reason` text,
	`late_cancel` integer DEFAULT false NOT NULL,
	`dispatched_at` integer,
	`dispatched_by_id` text,
	`preflight_record_id` text,
	`checked_in_at` integer,
	`flight_id` text,
	`created_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`instructor_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`cancelled_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`dispatched_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`flight_id`) REFERENCES `flights`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "bookings_window" CHECK("bookings"."ends_at" > "bookings"."starts_at" AND "bookings"."ends_at" - "bookings"."starts_at" <= 1209600000),
	CONSTRAINT "bookings_instructor_not_member" CHECK("bookings"."instructor_user_id" IS NULL OR "bookings"."instructor_user_id" <> "bookings"."user_id")
);
--> statement-breakpoint
CREATE INDEX `bookings_club_id` ON `bookings` (`club_id`);--> statement-breakpoint
CREATE INDEX `bookings_aircraft_time` ON `bookings` (`club_id`,`aircraft_id`,`starts_at`);--> statement-breakpoint
CREATE INDEX `bookings_instructor_time` ON `bookings` (`club_id`,`instructor_user_id`,`starts_at`);--> statement-breakpoint
CREATE INDEX `bookings_member_time` ON `bookings` (`club_id`,`user_id`,`starts_at`);--> statement-breakpoint
CREATE INDEX `bookings_club_time` ON `bookings` (`club_id`,`starts_at`);--> statement-breakpoint
CREATE UNIQUE INDEX `bookings_flight_once` ON `bookings` (`flight_id`);--> statement-breakpoint
CREATE TABLE `calendar_feed_tokens` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`user_id` text NOT NULL,
	`token_hash` text NOT NULL,
	`revoked_at` integer,
	`last_fetched_at` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `calendar_feed_tokens_token_hash_unique` ON `calendar_feed_tokens` (`token_hash`);--> statement-breakpoint
CREATE INDEX `calendar_feed_tokens_club_user` ON `calendar_feed_tokens` (`club_id`,`user_id`);--> statement-breakpoint
CREATE TABLE `preflight_record_items` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`record_id` text NOT NULL,
	`template_item_id` text,
	`section` text NOT NULL,
	`label` text NOT NULL,
	`kind` text NOT NULL,
	`result` text NOT NULL,
	`note` text,
	`squawk_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`record_id`) REFERENCES `preflight_records`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`template_item_id`) REFERENCES `preflight_template_items`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`squawk_id`) REFERENCES `squawks`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `preflight_record_items_club_id` ON `preflight_record_items` (`club_id`,`record_id`);--> statement-breakpoint
CREATE TABLE `preflight_records` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`booking_id` text NOT NULL,
	`aircraft_id` text NOT NULL,
	`user_id` text NOT NULL,
	`template_id` text,
	`fuel` text NOT NULL,
	`fuel_unit` text NOT NULL,
	`sumps` text NOT NULL,
	`oil_quantity` real NOT NULL,
	`oil_minimum` real NOT NULL,
	`oil_unit` text NOT NULL,
	`outcome` text NOT NULL,
	`finding_count` integer DEFAULT 0 NOT NULL,
	`notes` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`booking_id`) REFERENCES `bookings`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`template_id`) REFERENCES `preflight_templates`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `preflight_records_club_id` ON `preflight_records` (`club_id`);--> statement-breakpoint
CREATE INDEX `preflight_records_booking` ON `preflight_records` (`club_id`,`booking_id`);--> statement-breakpoint
CREATE TABLE `preflight_template_items` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`template_id` text NOT NULL,
	`section` text NOT NULL,
	`label` text NOT NULL,
	`kind` text DEFAULT 'check' NOT NULL,
	`position` integer NOT NULL,
	`retired_at` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`template_id`) REFERENCES `preflight_templates`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `preflight_template_items_club_id` ON `preflight_template_items` (`club_id`,`template_id`);--> statement-breakpoint
CREATE TABLE `preflight_templates` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`aircraft_id` text NOT NULL,
	`oil_minimum` real NOT NULL,
	`oil_maximum` real,
	`sump_points` text NOT NULL,
	`updated_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`updated_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `preflight_templates_club_id` ON `preflight_templates` (`club_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `preflight_templates_aircraft` ON `preflight_templates` (`aircraft_id`);--> statement-breakpoint
CREATE TABLE `weight_balance_profiles` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`aircraft_id` text NOT NULL,
	`unit_system` text NOT NULL,
	`empty_weight` real NOT NULL,
	`empty_arm` real NOT NULL,
	`max_takeoff_weight` real NOT NULL,
	`max_landing_weight` real,
	`stations` text NOT NULL,
	`tanks` text NOT NULL,
	`fuel_kind` text DEFAULT 'avgas' NOT NULL,
	`burn_per_hour` real,
	`envelope_normal` text NOT NULL,
	`envelope_utility` text,
	`source` text,
	`updated_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`updated_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `weight_balance_profiles_club_id` ON `weight_balance_profiles` (`club_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `weight_balance_profiles_aircraft` ON `weight_balance_profiles` (`aircraft_id`);