CREATE TABLE `bank_lines` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`statement_id` text NOT NULL,
	`line_no` integer NOT NULL,
	`posted_on` text NOT NULL,
	`amount_minor` integer NOT NULL,
	`description` text NOT NULL,
	`reference` text,
	`dedupe_key` text NOT NULL,
	`ignored` integer DEFAULT false NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`statement_id`) REFERENCES `bank_statements`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `bank_lines_club_dedupe` ON `bank_lines` (`club_id`,`dedupe_key`);--> statement-breakpoint
CREATE INDEX `bank_lines_club_id` ON `bank_lines` (`club_id`,`statement_id`);--> statement-breakpoint
CREATE INDEX `bank_lines_posted` ON `bank_lines` (`club_id`,`posted_on`);--> statement-breakpoint
CREATE TABLE `bank_statements` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`upload_id` text,
	`format` text NOT NULL,
	`file_name` text NOT NULL,
	`mapping` text,
	`period_start` text NOT NULL,
	`period_end` text NOT NULL,
	`closing_balance_minor` integer NOT NULL,
	`currency` text NOT NULL,
	`line_count` integer NOT NULL,
	`skipped_count` integer DEFAULT 0 NOT NULL,
	`imported_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`upload_id`) REFERENCES `uploads`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`imported_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `bank_statements_club_id` ON `bank_statements` (`club_id`,`period_end`);--> statement-breakpoint
CREATE TABLE `billing_runs` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`period_start` text NOT NULL,
	`period_end` text NOT NULL,
	`run_count` integer DEFAULT 1 NOT NULL,
	`entries_posted` integer DEFAULT 0 NOT NULL,
	`total_minor` integer DEFAULT 0 NOT NULL,
	`statements_issued` integer DEFAULT 0 NOT NULL,
	`ran_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`ran_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `billing_runs_club_period` ON `billing_runs` (`club_id`,`period_start`);--> statement-breakpoint
CREATE INDEX `billing_runs_club_id` ON `billing_runs` (`club_id`);--> statement-breakpoint
CREATE TABLE `card_payouts` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`payout_id` text NOT NULL,
	`net_minor` integer NOT NULL,
	`fee_minor` integer NOT NULL,
	`currency` text NOT NULL,
	`arrival_on` text NOT NULL,
	`received_entry_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`received_entry_id`) REFERENCES `journal_entries`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `card_payouts_club_payout` ON `card_payouts` (`club_id`,`payout_id`);--> statement-breakpoint
CREATE INDEX `card_payouts_club_id` ON `card_payouts` (`club_id`);--> statement-breakpoint
CREATE TABLE `dues_plans` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`name` text NOT NULL,
	`period` text NOT NULL,
	`category` text NOT NULL,
	`amount_minor` integer NOT NULL,
	`currency` text NOT NULL,
	`active` integer DEFAULT true NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `dues_plans_club_id` ON `dues_plans` (`club_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `dues_plans_club_name` ON `dues_plans` (`club_id`,`name`);--> statement-breakpoint
CREATE TABLE `dues_reminders` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`member_user_id` text NOT NULL,
	`sent_on` text NOT NULL,
	`balance_minor` integer NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`member_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `dues_reminders_once_a_day` ON `dues_reminders` (`club_id`,`member_user_id`,`sent_on`);--> statement-breakpoint
CREATE INDEX `dues_reminders_club_id` ON `dues_reminders` (`club_id`);--> statement-breakpoint
CREATE TABLE `journal_entries` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`entry_date` text NOT NULL,
	`kind` text NOT NULL,
	`memo` text NOT NULL,
	`currency` text NOT NULL,
	`member_user_id` text,
	`due_on` text,
	`source_type` text,
	`source_id` text,
	`source_key` text,
	`reference` text,
	`reverses_entry_id` text,
	`created_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`member_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `journal_entries_club_id` ON `journal_entries` (`club_id`,`entry_date`);--> statement-breakpoint
CREATE UNIQUE INDEX `journal_entries_source_key` ON `journal_entries` (`club_id`,`source_key`);--> statement-breakpoint
CREATE INDEX `journal_entries_source` ON `journal_entries` (`club_id`,`source_type`,`source_id`);--> statement-breakpoint
CREATE INDEX `journal_entries_member` ON `journal_entries` (`club_id`,`member_user_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `journal_entries_reverses` ON `journal_entries` (`reverses_entry_id`);--> statement-breakpoint
CREATE TABLE `journal_lines` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`entry_id` text NOT NULL,
	`line_no` integer NOT NULL,
	`account_id` text NOT NULL,
	`debit_minor` integer DEFAULT 0 NOT NULL,
	`credit_minor` integer DEFAULT 0 NOT NULL,
	`currency` text NOT NULL,
	`memo` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`entry_id`) REFERENCES `journal_entries`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`account_id`) REFERENCES `ledger_accounts`(`id`) ON UPDATE no action ON DELETE no action,
	CONSTRAINT "journal_lines_one_side" CHECK(("journal_lines"."debit_minor" > 0 AND "journal_lines"."credit_minor" = 0) OR ("journal_lines"."credit_minor" > 0 AND "journal_lines"."debit_minor" = 0))
);
--> statement-breakpoint
CREATE INDEX `journal_lines_club_id` ON `journal_lines` (`club_id`,`account_id`);--> statement-breakpoint
CREATE INDEX `journal_lines_entry` ON `journal_lines` (`entry_id`);--> statement-breakpoint
CREATE TABLE `ledger_accounts` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`code` text NOT NULL,
	`name` text NOT NULL,
	`type` text NOT NULL,
	`parent_code` text,
	`member_user_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`member_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `ledger_accounts_club_code` ON `ledger_accounts` (`club_id`,`code`);--> statement-breakpoint
CREATE INDEX `ledger_accounts_club_id` ON `ledger_accounts` (`club_id`,`member_user_id`);--> statement-breakpoint
CREATE TABLE `member_dues` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`member_user_id` text NOT NULL,
	`plan_id` text NOT NULL,
	`category` text NOT NULL,
	`starts_on` text NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`member_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`plan_id`) REFERENCES `dues_plans`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `member_dues_club_member` ON `member_dues` (`club_id`,`member_user_id`);--> statement-breakpoint
CREATE INDEX `member_dues_club_id` ON `member_dues` (`club_id`);--> statement-breakpoint
CREATE TABLE `money_settings` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`payment_terms_days` integer DEFAULT 14 NOT NULL,
	`late_fee_flat_minor` integer DEFAULT 0 NOT NULL,
	`late_fee_basis_points` integer DEFAULT 0 NOT NULL,
	`fuel_credit_cap_per_unit_minor` integer DEFAULT 0 NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `money_settings_club_id_unique` ON `money_settings` (`club_id`);--> statement-breakpoint
CREATE TABLE `payment_events` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`event_id` text NOT NULL,
	`type` text NOT NULL,
	`outcome` text NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `payment_events_club_event` ON `payment_events` (`club_id`,`event_id`);--> statement-breakpoint
CREATE INDEX `payment_events_club_id` ON `payment_events` (`club_id`);--> statement-breakpoint
CREATE TABLE `payment_refunds` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`payment_id` text NOT NULL,
	`provider_refund_id` text NOT NULL,
	`amount_minor` integer NOT NULL,
	`currency` text NOT NULL,
	`treatment` text NOT NULL,
	`payout_id` text,
	`journal_entry_id` text,
	`requested_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`payment_id`) REFERENCES `payments`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`journal_entry_id`) REFERENCES `journal_entries`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`requested_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `payment_refunds_provider_refund_id_unique` ON `payment_refunds` (`provider_refund_id`);--> statement-breakpoint
CREATE INDEX `payment_refunds_club_id` ON `payment_refunds` (`club_id`,`payment_id`);--> statement-breakpoint
CREATE TABLE `payments` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`member_user_id` text NOT NULL,
	`method` text NOT NULL,
	`status` text NOT NULL,
	`amount_minor` integer NOT NULL,
	`fee_minor` integer DEFAULT 0 NOT NULL,
	`refunded_minor` integer DEFAULT 0 NOT NULL,
	`currency` text NOT NULL,
	`received_on` text,
	`reference` text,
	`checkout_session_id` text,
	`payment_intent_id` text,
	`charge_id` text,
	`payout_id` text,
	`last_error` text,
	`journal_entry_id` text,
	`recorded_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`member_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`journal_entry_id`) REFERENCES `journal_entries`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`recorded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `payments_checkout_session_id_unique` ON `payments` (`checkout_session_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `payments_payment_intent_id_unique` ON `payments` (`payment_intent_id`);--> statement-breakpoint
CREATE INDEX `payments_club_id` ON `payments` (`club_id`,`member_user_id`);--> statement-breakpoint
CREATE INDEX `payments_charge` ON `payments` (`charge_id`);--> statement-breakpoint
CREATE INDEX `payments_payout` ON `payments` (`club_id`,`payout_id`);--> statement-breakpoint
CREATE TABLE `rate_profiles` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`name` text NOT NULL,
	`fixed_annual_costs_minor` integer NOT NULL,
	`expected_hours` integer NOT NULL,
	`fuel_burn_tenths_per_hour` integer NOT NULL,
	`fuel_price_minor` integer NOT NULL,
	`oil_per_hour_minor` integer NOT NULL,
	`maintenance_reserve_per_hour_minor` integer NOT NULL,
	`overhaul_cost_minor` integer NOT NULL,
	`tbo_hours` integer NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `rate_profiles_club_name` ON `rate_profiles` (`club_id`,`name`);--> statement-breakpoint
CREATE INDEX `rate_profiles_club_id` ON `rate_profiles` (`club_id`);--> statement-breakpoint
CREATE TABLE `reconciliation_matches` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`bank_line_id` text NOT NULL,
	`journal_line_id` text NOT NULL,
	`kind` text NOT NULL,
	`created_entry_id` text,
	`matched_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`bank_line_id`) REFERENCES `bank_lines`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`journal_line_id`) REFERENCES `journal_lines`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`created_entry_id`) REFERENCES `journal_entries`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`matched_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `reconciliation_matches_journal_line` ON `reconciliation_matches` (`journal_line_id`);--> statement-breakpoint
CREATE INDEX `reconciliation_matches_club_id` ON `reconciliation_matches` (`club_id`,`bank_line_id`);--> statement-breakpoint
CREATE TABLE `reconciliation_periods` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`statement_id` text NOT NULL,
	`period_start` text NOT NULL,
	`period_end` text NOT NULL,
	`statement_balance_minor` integer NOT NULL,
	`book_balance_minor` integer NOT NULL,
	`deposits_in_transit_minor` integer NOT NULL,
	`outstanding_cheques_minor` integer NOT NULL,
	`bank_charges_minor` integer NOT NULL,
	`bank_credits_minor` integer NOT NULL,
	`locked` integer DEFAULT true NOT NULL,
	`locked_by_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`statement_id`) REFERENCES `bank_statements`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`locked_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `reconciliation_periods_statement` ON `reconciliation_periods` (`statement_id`);--> statement-breakpoint
CREATE INDEX `reconciliation_periods_club_id` ON `reconciliation_periods` (`club_id`,`period_end`);--> statement-breakpoint
CREATE TABLE `statements` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`member_user_id` text NOT NULL,
	`period_start` text NOT NULL,
	`period_end` text NOT NULL,
	`opening_minor` integer NOT NULL,
	`charges_minor` integer NOT NULL,
	`credits_minor` integer NOT NULL,
	`closing_minor` integer NOT NULL,
	`currency` text NOT NULL,
	`billing_run_id` text,
	`emailed_at` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`member_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`billing_run_id`) REFERENCES `billing_runs`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `statements_club_member_period` ON `statements` (`club_id`,`member_user_id`,`period_start`);--> statement-breakpoint
CREATE INDEX `statements_club_id` ON `statements` (`club_id`);