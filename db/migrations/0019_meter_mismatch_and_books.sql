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
