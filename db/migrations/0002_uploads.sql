CREATE TABLE `uploads` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`subject_type` text NOT NULL,
	`subject_id` text,
	`owner_user_id` text,
	`uploaded_by_id` text NOT NULL,
	`mime_type` text NOT NULL,
	`size_bytes` integer NOT NULL,
	`sha256` text NOT NULL,
	`original_name` text NOT NULL,
	`storage_key` text NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`owner_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`uploaded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `uploads_storage_key_unique` ON `uploads` (`storage_key`);--> statement-breakpoint
CREATE INDEX `uploads_club_id` ON `uploads` (`club_id`);--> statement-breakpoint
CREATE INDEX `uploads_subject` ON `uploads` (`club_id`,`subject_type`,`subject_id`);