CREATE TABLE `recurring_bills` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`vendor` text NOT NULL,
	`account_code` text NOT NULL,
	`amount_minor` integer NOT NULL,
	`currency` text NOT NULL,
	`reference` text,
	`cadence` text NOT NULL,
	`anchor_day` integer NOT NULL,
	`next_on` text NOT NULL,
	`ends_on` text,
	`due_days` integer DEFAULT 0 NOT NULL,
	`status` text DEFAULT 'active' NOT NULL,
	`created_by_id` text NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT `recurring_bills_cadence` CHECK(`cadence` in ('monthly', 'quarterly', 'yearly')),
	CONSTRAINT `recurring_bills_status` CHECK(`status` in ('active', 'paused', 'ended')),
	CONSTRAINT `recurring_bills_amount` CHECK(`amount_minor` > 0)
);
--> statement-breakpoint
CREATE INDEX `recurring_bills_club_id` ON `recurring_bills` (`club_id`,`status`,`next_on`);--> statement-breakpoint
ALTER TABLE `bills` ADD `recurring_bill_id` text REFERENCES recurring_bills(id);--> statement-breakpoint
ALTER TABLE `bills` ADD `period_key` text;--> statement-breakpoint
CREATE UNIQUE INDEX `bills_recurring_period` ON `bills` (`club_id`,`recurring_bill_id`,`period_key`);--> statement-breakpoint
CREATE TABLE `budgets` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`account_code` text NOT NULL,
	`month` text NOT NULL,
	`amount_minor` integer NOT NULL,
	`currency` text NOT NULL,
	`updated_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`updated_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT `budgets_amount` CHECK(`amount_minor` >= 0)
);
--> statement-breakpoint
CREATE UNIQUE INDEX `budgets_club_account_month` ON `budgets` (`club_id`,`account_code`,`month`);--> statement-breakpoint
CREATE INDEX `budgets_club_id` ON `budgets` (`club_id`,`month`);--> statement-breakpoint
CREATE TABLE `year_closes` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`year` integer NOT NULL,
	`closed_through` text NOT NULL,
	`entry_id` text,
	`net_income_minor` integer NOT NULL,
	`closed_by_id` text NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`entry_id`) REFERENCES `journal_entries`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`closed_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `year_closes_club_year` ON `year_closes` (`club_id`,`year`);--> statement-breakpoint
CREATE TRIGGER year_closes_no_update BEFORE UPDATE ON year_closes
BEGIN SELECT RAISE(ABORT, 'a closed year stays closed'); END;
--> statement-breakpoint
CREATE TRIGGER year_closes_no_delete BEFORE DELETE ON year_closes
BEGIN SELECT RAISE(ABORT, 'a closed year stays closed'); END;
