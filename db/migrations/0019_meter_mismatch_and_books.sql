ALTER TABLE `flights` ADD `meter_explanation` text;--> statement-breakpoint
ALTER TABLE `flights` ADD `gap_settled_at` integer;--> statement-breakpoint
ALTER TABLE `flights` ADD `gap_settled_by_id` text REFERENCES users(id);--> statement-breakpoint
ALTER TABLE `flights` ADD `gap_settled_note` text;--> statement-breakpoint
ALTER TABLE `flights` ADD `booking_id` text;--> statement-breakpoint
CREATE UNIQUE INDEX `flights_booking` ON `flights` (`club_id`,`booking_id`);--> statement-breakpoint
UPDATE `flights` SET `booking_id` = (SELECT b.`id` FROM `bookings` b WHERE b.`flight_id` = `flights`.`id` AND b.`club_id` = `flights`.`club_id` LIMIT 1);
--> statement-breakpoint
INSERT INTO `ledger_accounts` (`id`, `club_id`, `code`, `name`, `type`, `created_at`, `updated_at`)
SELECT lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4' || substr(lower(hex(randomblob(2))), 2) || '-' || substr('89ab', 1 + (abs(random()) % 4), 1) || substr(lower(hex(randomblob(2))), 2) || '-' || lower(hex(randomblob(6))), c.`id`, v.code, v.name, v.type, CAST(strftime('%s', 'now') AS INTEGER) * 1000, CAST(strftime('%s', 'now') AS INTEGER) * 1000
FROM `clubs` c CROSS JOIN (SELECT 'aircraft-insurance' AS code, 'Aircraft insurance' AS name, 'expense' AS type UNION ALL SELECT 'hangar-tie-down' AS code, 'Hangar and tie-down' AS name, 'expense' AS type UNION ALL SELECT 'fuel-oil' AS code, 'Fuel and oil' AS name, 'expense' AS type UNION ALL SELECT 'maintenance' AS code, 'Maintenance and inspections' AS name, 'expense' AS type UNION ALL SELECT 'engine-reserve' AS code, 'Engine reserve (set aside per hour)' AS name, 'expense' AS type UNION ALL SELECT 'loan-interest' AS code, 'Loan interest' AS name, 'expense' AS type UNION ALL SELECT 'instruction-income' AS code, 'Instruction' AS name, 'income' AS type UNION ALL SELECT 'interest-income' AS code, 'Bank interest' AS name, 'income' AS type UNION ALL SELECT 'other-income' AS code, 'Other income' AS name, 'income' AS type UNION ALL SELECT 'bills-payable' AS code, 'Bills to pay' AS name, 'liability' AS type UNION ALL SELECT 'aircraft-loan' AS code, 'Aircraft loan' AS name, 'liability' AS type UNION ALL SELECT 'engine-reserve-fund' AS code, 'Engine overhaul reserve' AS name, 'liability' AS type) v
WHERE EXISTS (SELECT 1 FROM `ledger_accounts` a WHERE a.`club_id` = c.`id`)
ON CONFLICT DO NOTHING;
--> statement-breakpoint
CREATE TABLE `bills` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`vendor` text NOT NULL,
	`bill_date` text NOT NULL,
	`due_on` text NOT NULL,
	`account_code` text NOT NULL,
	`amount_minor` integer NOT NULL,
	`currency` text NOT NULL,
	`reference` text,
	`status` text NOT NULL,
	`entered_by_id` text NOT NULL,
	`approved_by_id` text,
	`approved_at` integer,
	`entry_id` text NOT NULL,
	`paid_on` text,
	`paid_by_id` text,
	`payment_entry_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`entered_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`approved_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`entry_id`) REFERENCES `journal_entries`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`paid_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`payment_entry_id`) REFERENCES `journal_entries`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `bills_club_id` ON `bills` (`club_id`,`status`,`due_on`);--> statement-breakpoint
ALTER TABLE `money_settings` ADD `bill_approval_over_minor` integer DEFAULT 50000 NOT NULL;