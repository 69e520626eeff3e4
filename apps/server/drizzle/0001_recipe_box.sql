CREATE TABLE `recipes` (
	`id` text PRIMARY KEY NOT NULL,
	`kitchen_id` text NOT NULL,
	`name` text NOT NULL,
	`data` text NOT NULL,
	`copied_from` text,
	`created_by` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`kitchen_id`) REFERENCES `kitchens`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `recipes_kitchen_idx` ON `recipes` (`kitchen_id`);