CREATE TABLE `idempotent_writes` (
	`club_id` text NOT NULL,
	`key` text NOT NULL,
	`action_name` text NOT NULL,
	`actor_user_id` text,
	`answer_json` text NOT NULL,
	`created_at` integer NOT NULL,
	PRIMARY KEY(`club_id`, `key`)
);
--> statement-breakpoint
CREATE INDEX `idempotent_writes_created_at` ON `idempotent_writes` (`created_at`);