CREATE TABLE `aircraft` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`registration` text NOT NULL,
	`make` text NOT NULL,
	`model` text NOT NULL,
	`type_group` text NOT NULL,
	`category` text DEFAULT 'Airplane' NOT NULL,
	`class_rating` text DEFAULT 'Single-engine land' NOT NULL,
	`serial_number` text,
	`year` integer,
	`home_field` text,
	`photo_upload_id` text,
	`hourly_rate_minor` integer DEFAULT 0 NOT NULL,
	`rate_meter` text DEFAULT 'hobbs' NOT NULL,
	`maintenance_meter` text DEFAULT 'tach' NOT NULL,
	`current_hobbs` real,
	`current_tach` real,
	`used_for_hire` integer DEFAULT false NOT NULL,
	`used_for_instruction` integer DEFAULT false NOT NULL,
	`ifr_equipped` integer DEFAULT false NOT NULL,
	`used_for_ifr` integer DEFAULT false NOT NULL,
	`engine_tbo_hours` real,
	`engine_time_since_overhaul` real,
	`notes` text,
	`retired_at` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `aircraft_club_id` ON `aircraft` (`club_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `aircraft_club_registration` ON `aircraft` (`club_id`,`registration`);--> statement-breakpoint
CREATE TABLE `flights` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`aircraft_id` text NOT NULL,
	`pilot_id` text NOT NULL,
	`flown_on` text NOT NULL,
	`hobbs_out` real NOT NULL,
	`hobbs_in` real NOT NULL,
	`tach_out` real NOT NULL,
	`tach_in` real NOT NULL,
	`day_landings` integer DEFAULT 0 NOT NULL,
	`night_full_stop_landings` integer DEFAULT 0 NOT NULL,
	`fuel_added` real DEFAULT 0 NOT NULL,
	`oil_added` real DEFAULT 0 NOT NULL,
	`fuel_unit` text NOT NULL,
	`oil_unit` text NOT NULL,
	`notes` text,
	`continuity` text DEFAULT 'ok' NOT NULL,
	`continuity_text` text,
	`continuity_reviewed_at` integer,
	`continuity_reviewed_by_id` text,
	`continuity_review_note` text,
	`recorded_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`pilot_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`continuity_reviewed_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recorded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `flights_club_id` ON `flights` (`club_id`);--> statement-breakpoint
CREATE INDEX `flights_continuity` ON `flights` (`club_id`,`aircraft_id`,`hobbs_out`);--> statement-breakpoint
CREATE INDEX `flights_flagged` ON `flights` (`club_id`,`continuity`);--> statement-breakpoint
CREATE TABLE `grounding_notices` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`aircraft_id` text NOT NULL,
	`category` text NOT NULL,
	`reason` text NOT NULL,
	`effective_at` integer NOT NULL,
	`issued_by_id` text,
	`lifted_at` integer,
	`lifted_by_id` text,
	`lift_note` text,
	`lift_mechanic_name` text,
	`lift_certificate` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`issued_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`lifted_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `grounding_notices_club_id` ON `grounding_notices` (`club_id`,`aircraft_id`,`lifted_at`);--> statement-breakpoint
CREATE TABLE `inspection_completions` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`aircraft_id` text NOT NULL,
	`item_id` text NOT NULL,
	`done_on` text NOT NULL,
	`hours` real,
	`expires_on` text,
	`mechanic_name` text NOT NULL,
	`mechanic_certificate` text NOT NULL,
	`notes` text,
	`recorded_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`item_id`) REFERENCES `inspection_items`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recorded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `inspection_completions_club_id` ON `inspection_completions` (`club_id`);--> statement-breakpoint
CREATE INDEX `inspection_completions_item` ON `inspection_completions` (`club_id`,`item_id`,`done_on`);--> statement-breakpoint
CREATE TABLE `inspection_items` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`aircraft_id` text NOT NULL,
	`key` text NOT NULL,
	`name` text NOT NULL,
	`origin` text DEFAULT 'regulation' NOT NULL,
	`rule_kind` text NOT NULL,
	`months` integer,
	`hours` real,
	`days` integer,
	`overrun_hours` real,
	`required` integer DEFAULT true NOT NULL,
	`ifr_only` integer DEFAULT false NOT NULL,
	`hire_or_instruction_only` integer DEFAULT false NOT NULL,
	`satisfied_by` text,
	`usage_limit_hours` real,
	`usage_used_hours` real,
	`source` text,
	`retired_at` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `inspection_items_club_id` ON `inspection_items` (`club_id`,`aircraft_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `inspection_items_aircraft_key` ON `inspection_items` (`aircraft_id`,`key`);--> statement-breakpoint
CREATE TABLE `squawk_events` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`squawk_id` text NOT NULL,
	`kind` text NOT NULL,
	`from_triage` text,
	`to_triage` text,
	`note` text,
	`actor_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`squawk_id`) REFERENCES `squawks`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `squawk_events_club_id` ON `squawk_events` (`club_id`,`squawk_id`);--> statement-breakpoint
CREATE TABLE `squawks` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`aircraft_id` text NOT NULL,
	`flight_id` text,
	`reported_by_id` text,
	`description` text NOT NULL,
	`found_during` text NOT NULL,
	`suspected_grounding` integer DEFAULT false NOT NULL,
	`triage` text DEFAULT 'untriaged' NOT NULL,
	`limitation` text,
	`placarded` integer DEFAULT false NOT NULL,
	`deferral_determined_by` text,
	`status` text DEFAULT 'open' NOT NULL,
	`repair_notes` text,
	`rts_mechanic_name` text,
	`rts_certificate` text,
	`rts_on` text,
	`closed_at` integer,
	`closed_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`reported_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`closed_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `squawks_club_id` ON `squawks` (`club_id`);--> statement-breakpoint
CREATE INDEX `squawks_open` ON `squawks` (`club_id`,`status`,`aircraft_id`);