CREATE TABLE `job_engineer_items` (
	`id` text PRIMARY KEY NOT NULL,
	`org_id` text NOT NULL,
	`job_id` text NOT NULL,
	`request_id` text NOT NULL,
	`version` integer NOT NULL,
	`position` integer NOT NULL,
	`item` text NOT NULL,
	`photo_asked` integer NOT NULL,
	`state` text NOT NULL,
	`note` text NOT NULL,
	`photo_ids` text NOT NULL,
	`updated_by` text,
	`updated_at` text,
	`created_at` text NOT NULL,
	FOREIGN KEY (`org_id`) REFERENCES `organizations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`request_id`) REFERENCES `design_requests`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`updated_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `job_engineer_items_request_version_position` ON `job_engineer_items` (`request_id`,`version`,`position`);--> statement-breakpoint
CREATE INDEX `job_engineer_items_job` ON `job_engineer_items` (`job_id`);