CREATE TABLE `steps` (
	`day_id` text NOT NULL,
	`subject` text NOT NULL,
	`subject_id` text NOT NULL,
	`step` text NOT NULL,
	`done` integer NOT NULL,
	`at` integer NOT NULL,
	`by_user_id` text NOT NULL,
	`by_name` text NOT NULL,
	PRIMARY KEY(`day_id`, `subject_id`, `step`),
	FOREIGN KEY (`day_id`) REFERENCES `days`(`id`) ON UPDATE no action ON DELETE cascade
);
