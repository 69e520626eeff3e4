CREATE TABLE `attachments` (
	`id` text PRIMARY KEY NOT NULL,
	`kitchen_id` text NOT NULL,
	`subject` text NOT NULL,
	`subject_id` text NOT NULL,
	`file_name` text NOT NULL,
	`mime` text NOT NULL,
	`bytes` integer NOT NULL,
	`storage_key` text NOT NULL,
	`thumb_key` text,
	`width` integer,
	`height` integer,
	`uploaded_by` text,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`kitchen_id`) REFERENCES `kitchens`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `attachments_subject_idx` ON `attachments` (`kitchen_id`,`subject`,`subject_id`);--> statement-breakpoint
CREATE TABLE `lot_entries` (
	`id` text PRIMARY KEY NOT NULL,
	`lot_id` text NOT NULL,
	`kind` text NOT NULL,
	`jars` integer NOT NULL,
	`recipient` text,
	`date` text NOT NULL,
	`note` text,
	`by_user_id` text,
	`by_name` text NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`lot_id`) REFERENCES `lots`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`by_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `lot_entries_lot_idx` ON `lot_entries` (`lot_id`);--> statement-breakpoint
CREATE TABLE `lots` (
	`id` text PRIMARY KEY NOT NULL,
	`kitchen_id` text NOT NULL,
	`day_id` text NOT NULL,
	`batch_id` text NOT NULL,
	`code` text NOT NULL,
	`public_token` text NOT NULL,
	`location` text,
	`best_by` text NOT NULL,
	`flagged_at` integer,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`kitchen_id`) REFERENCES `kitchens`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`day_id`) REFERENCES `days`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`batch_id`) REFERENCES `batches`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `lots_batch_idx` ON `lots` (`batch_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `lots_kitchen_code_idx` ON `lots` (`kitchen_id`,`code`);--> statement-breakpoint
CREATE UNIQUE INDEX `lots_token_idx` ON `lots` (`public_token`);--> statement-breakpoint
CREATE TABLE `reminders` (
	`id` text PRIMARY KEY NOT NULL,
	`kitchen_id` text NOT NULL,
	`load_id` text NOT NULL,
	`kind` text NOT NULL,
	`due_at` integer NOT NULL,
	`claimed_at` integer NOT NULL,
	`sent_at` integer,
	`recipients` integer DEFAULT 0 NOT NULL,
	`note` text,
	FOREIGN KEY (`kitchen_id`) REFERENCES `kitchens`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`load_id`) REFERENCES `loads`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `reminders_load_kind_idx` ON `reminders` (`load_id`,`kind`);--> statement-breakpoint
CREATE TABLE `seal_checks` (
	`load_id` text NOT NULL,
	`jar_number` integer NOT NULL,
	`day_id` text NOT NULL,
	`result` text NOT NULL,
	`outcome` text NOT NULL,
	`checked_at` integer NOT NULL,
	`by_user_id` text,
	`by_name` text NOT NULL,
	PRIMARY KEY(`load_id`, `jar_number`),
	FOREIGN KEY (`load_id`) REFERENCES `loads`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`day_id`) REFERENCES `days`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`by_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `seal_checks_day_idx` ON `seal_checks` (`day_id`);--> statement-breakpoint
ALTER TABLE `canners` ADD `water_litres` real;--> statement-breakpoint
ALTER TABLE `canners` ADD `burner_watts` integer;--> statement-breakpoint
ALTER TABLE `memberships` ADD `reminders` integer DEFAULT true NOT NULL;--> statement-breakpoint
ALTER TABLE `loads` ADD `reprocess_of` text;--> statement-breakpoint
ALTER TABLE `loads` ADD `bands_off_at` integer;--> statement-breakpoint
ALTER TABLE `loads` ADD `bands_off_by` text;--> statement-breakpoint
ALTER TABLE `loads` ADD `bands_off_override` text;--> statement-breakpoint
CREATE INDEX `loads_reprocess_of_idx` ON `loads` (`reprocess_of`);