CREATE TABLE `bulletin_acknowledgements` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`bulletin_id` text NOT NULL,
	`user_id` text NOT NULL,
	`acknowledged_at` integer NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`bulletin_id`) REFERENCES `bulletins`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `bulletin_acknowledgements_once` ON `bulletin_acknowledgements` (`bulletin_id`,`user_id`);--> statement-breakpoint
CREATE INDEX `bulletin_acknowledgements_club_id` ON `bulletin_acknowledgements` (`club_id`);--> statement-breakpoint
CREATE TABLE `bulletins` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`series_id` text NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`supersedes_id` text,
	`status` text DEFAULT 'draft' NOT NULL,
	`title` text NOT NULL,
	`body_markdown` text NOT NULL,
	`urgency` text NOT NULL,
	`audience` text NOT NULL,
	`audience_type_group` text,
	`attachment_upload_id` text,
	`acknowledge_by` text,
	`source_report_id` text,
	`created_by_id` text NOT NULL,
	`published_by_id` text,
	`published_at` integer,
	`superseded_at` integer,
	`superseded_by_id` text,
	`last_reminded_at` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`supersedes_id`) REFERENCES `bulletins`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`attachment_upload_id`) REFERENCES `uploads`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`source_report_id`) REFERENCES `safety_reports`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`published_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `bulletins_club_id` ON `bulletins` (`club_id`,`status`);--> statement-breakpoint
CREATE UNIQUE INDEX `bulletins_series_version` ON `bulletins` (`series_id`,`version`);--> statement-breakpoint
CREATE TABLE `checkouts` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`user_id` text NOT NULL,
	`type_group` text NOT NULL,
	`checked_out_on` text NOT NULL,
	`instructor_id` text NOT NULL,
	`instructor_certificate_number` text NOT NULL,
	`conditions` text,
	`revoked_at` integer,
	`revoked_by_id` text,
	`revoke_reason` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`instructor_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`revoked_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `checkouts_club_user` ON `checkouts` (`club_id`,`user_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `checkouts_active_once` ON `checkouts` (`club_id`,`user_id`,`type_group`) WHERE revoked_at is null;--> statement-breakpoint
CREATE TABLE `medical_certificates` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`user_id` text NOT NULL,
	`kind` text NOT NULL,
	`medical_class` integer,
	`exam_date` text NOT NULL,
	`course_date` text,
	`limitations` text,
	`expires_on` text NOT NULL,
	`reminder_sent_for` text,
	`recorded_by_id` text NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recorded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `medical_certificates_club_user` ON `medical_certificates` (`club_id`,`user_id`);--> statement-breakpoint
CREATE TABLE `member_documents` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`user_id` text NOT NULL,
	`kind` text NOT NULL,
	`reference` text,
	`details` text,
	`issued_on` text NOT NULL,
	`expires_on` text,
	`upload_id` text,
	`reminder_sent_for` text,
	`recorded_by_id` text NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`upload_id`) REFERENCES `uploads`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recorded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `member_documents_club_user` ON `member_documents` (`club_id`,`user_id`,`kind`);--> statement-breakpoint
CREATE TABLE `member_private_records` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`user_id` text NOT NULL,
	`birth_date` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `member_private_records_club_user` ON `member_private_records` (`club_id`,`user_id`);--> statement-breakpoint
CREATE TABLE `outside_flight_entries` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`user_id` text NOT NULL,
	`flown_on` text NOT NULL,
	`type_group` text,
	`aircraft_description` text NOT NULL,
	`day_landings` integer NOT NULL,
	`night_full_stop_landings` integer NOT NULL,
	`note` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `outside_flight_entries_club_user` ON `outside_flight_entries` (`club_id`,`user_id`);--> statement-breakpoint
CREATE TABLE `safety_report_events` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`report_id` text NOT NULL,
	`actor_id` text NOT NULL,
	`kind` text NOT NULL,
	`from_status` text,
	`to_status` text,
	`note` text,
	`bulletin_id` text,
	`grounding_notice_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`report_id`) REFERENCES `safety_reports`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`bulletin_id`) REFERENCES `bulletins`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `safety_report_events_report` ON `safety_report_events` (`club_id`,`report_id`);--> statement-breakpoint
CREATE TABLE `safety_reports` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`reporter_id` text,
	`anonymous` integer NOT NULL,
	`occurred_on` text NOT NULL,
	`occurred_time` text,
	`location` text NOT NULL,
	`aircraft_id` text,
	`what_happened` text NOT NULL,
	`contributing_factors` text NOT NULL,
	`factors_note` text,
	`status` text DEFAULT 'received' NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`reporter_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`aircraft_id`) REFERENCES `aircraft`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `safety_reports_club_id` ON `safety_reports` (`club_id`,`status`);--> statement-breakpoint
CREATE INDEX `safety_reports_reporter` ON `safety_reports` (`club_id`,`reporter_id`);