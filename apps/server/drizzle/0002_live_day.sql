CREATE TABLE `batches` (
	`id` text PRIMARY KEY NOT NULL,
	`day_id` text NOT NULL,
	`recipe_id` text NOT NULL,
	`recipe` text NOT NULL,
	`jar_size` text NOT NULL,
	`pack` text NOT NULL,
	`jars` integer NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`day_id`) REFERENCES `days`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `batches_day_idx` ON `batches` (`day_id`);--> statement-breakpoint
CREATE TABLE `command_ledger` (
	`command_id` text PRIMARY KEY NOT NULL,
	`day_id` text NOT NULL,
	`user_id` text NOT NULL,
	`answer` text NOT NULL,
	`at` integer NOT NULL,
	FOREIGN KEY (`day_id`) REFERENCES `days`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `command_ledger_day_idx` ON `command_ledger` (`day_id`);--> statement-breakpoint
CREATE TABLE `days` (
	`id` text PRIMARY KEY NOT NULL,
	`kitchen_id` text NOT NULL,
	`date` text NOT NULL,
	`title` text NOT NULL,
	`altitude_value` real NOT NULL,
	`altitude_unit` text NOT NULL,
	`status` text NOT NULL,
	`last_seq` integer DEFAULT 0 NOT NULL,
	`created_by` text,
	`created_at` integer NOT NULL,
	`closed_at` integer,
	FOREIGN KEY (`kitchen_id`) REFERENCES `kitchens`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `days_kitchen_idx` ON `days` (`kitchen_id`,`date`);--> statement-breakpoint
CREATE TABLE `journal` (
	`day_id` text NOT NULL,
	`seq` integer NOT NULL,
	`at` integer NOT NULL,
	`actor_id` text,
	`actor_name` text NOT NULL,
	`device_id` text NOT NULL,
	`type` text NOT NULL,
	`payload` text NOT NULL,
	PRIMARY KEY(`day_id`, `seq`),
	FOREIGN KEY (`day_id`) REFERENCES `days`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE TABLE `loads` (
	`id` text PRIMARY KEY NOT NULL,
	`day_id` text NOT NULL,
	`batch_id` text NOT NULL,
	`canner_id` text,
	`canner_name` text NOT NULL,
	`method` text NOT NULL,
	`jars` integer NOT NULL,
	`number` integer NOT NULL,
	`plan` text NOT NULL,
	`lifted_at` integer,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`day_id`) REFERENCES `days`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`batch_id`) REFERENCES `batches`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`canner_id`) REFERENCES `canners`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `loads_day_idx` ON `loads` (`day_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `loads_day_number_idx` ON `loads` (`day_id`,`number`);--> statement-breakpoint
CREATE TABLE `timers` (
	`id` text PRIMARY KEY NOT NULL,
	`day_id` text NOT NULL,
	`data` text NOT NULL,
	`next_deadline_at` integer,
	`version` integer NOT NULL,
	FOREIGN KEY (`day_id`) REFERENCES `days`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `timers_day_idx` ON `timers` (`day_id`);--> statement-breakpoint
CREATE INDEX `timers_deadline_idx` ON `timers` (`next_deadline_at`);