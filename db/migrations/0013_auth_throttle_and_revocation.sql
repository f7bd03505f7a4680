CREATE TABLE `revoked_sessions` (
	`session_id` text PRIMARY KEY NOT NULL,
	`user_id` text NOT NULL,
	`expires_at` integer NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `revoked_sessions_expires_at` ON `revoked_sessions` (`expires_at`);--> statement-breakpoint
CREATE INDEX `revoked_sessions_user_id` ON `revoked_sessions` (`user_id`);--> statement-breakpoint
CREATE TABLE `sign_in_link_requests` (
	`id` text PRIMARY KEY NOT NULL,
	`email_key` text NOT NULL,
	`client_key` text NOT NULL,
	`created_at` integer NOT NULL
);
--> statement-breakpoint
CREATE INDEX `sign_in_link_requests_email_key` ON `sign_in_link_requests` (`email_key`,`created_at`);--> statement-breakpoint
CREATE INDEX `sign_in_link_requests_client_key` ON `sign_in_link_requests` (`client_key`,`created_at`);--> statement-breakpoint
CREATE INDEX `sign_in_link_requests_created_at` ON `sign_in_link_requests` (`created_at`);--> statement-breakpoint
-- The attempts table only ever held throttling data for the last minutes; it is rebuilt rather
-- than altered (a NOT NULL column cannot be added to SQLite without a default).
DROP TABLE `sign_in_attempts`;--> statement-breakpoint
CREATE TABLE `sign_in_attempts` (
	`id` text PRIMARY KEY NOT NULL,
	`email_key` text NOT NULL,
	`client_key` text NOT NULL,
	`outcome` text NOT NULL,
	`counts_for_account` integer DEFAULT true NOT NULL,
	`created_at` integer NOT NULL
);
--> statement-breakpoint
CREATE INDEX `sign_in_attempts_email_key` ON `sign_in_attempts` (`email_key`,`created_at`);--> statement-breakpoint
CREATE INDEX `sign_in_attempts_client_key` ON `sign_in_attempts` (`client_key`,`created_at`);--> statement-breakpoint
CREATE INDEX `sign_in_attempts_created_at` ON `sign_in_attempts` (`created_at`);--> statement-breakpoint
ALTER TABLE `users` ADD `sessions_valid_after` integer;