-- The flight sheet's Out | In columns: fuel on board and the clock time at each end (optional;
-- the meters stay the record that is charged). The preflight template's fuel tanks: name and
-- usable capacity, in the club's fuel unit (empty: the weight-and-balance tanks are used).
ALTER TABLE `flights` ADD `fuel_out` real;
--> statement-breakpoint
ALTER TABLE `flights` ADD `fuel_in` real;
--> statement-breakpoint
ALTER TABLE `flights` ADD `time_out` text;
--> statement-breakpoint
ALTER TABLE `flights` ADD `time_in` text;
--> statement-breakpoint
ALTER TABLE `preflight_templates` ADD `fuel_tanks` text DEFAULT '[]' NOT NULL;
