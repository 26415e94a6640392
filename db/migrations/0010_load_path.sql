CREATE TABLE `load_path_bearings` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`org_id` text NOT NULL,
	`from_id` text NOT NULL,
	`end` text NOT NULL,
	`onto_id` text NOT NULL,
	`at_ft` real,
	`hanger` integer,
	`through` text,
	`joist_relation` text,
	`updated_at` text NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`org_id`) REFERENCES `organizations`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `load_path_bearings_end` ON `load_path_bearings` (`from_id`,`end`);--> statement-breakpoint
CREATE INDEX `load_path_bearings_job` ON `load_path_bearings` (`job_id`);--> statement-breakpoint
CREATE TABLE `load_path_elements` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`org_id` text NOT NULL,
	`kind` text NOT NULL,
	`label` text NOT NULL,
	`element` text NOT NULL,
	`created_by` text NOT NULL,
	`created_at` text NOT NULL,
	`updated_at` text NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`org_id`) REFERENCES `organizations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `load_path_elements_job` ON `load_path_elements` (`job_id`,`created_at`);