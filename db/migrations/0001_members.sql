CREATE TABLE `members` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`org_id` text NOT NULL,
	`kind` text NOT NULL,
	`label` text NOT NULL,
	`wall` text NOT NULL,
	`input` text NOT NULL,
	`material_id` text NOT NULL,
	`size_id` text NOT NULL,
	`summary` text NOT NULL,
	`result` text NOT NULL,
	`prescriptive` text,
	`engine_version` text NOT NULL,
	`created_by` text NOT NULL,
	`updated_by` text NOT NULL,
	`created_at` text NOT NULL,
	`updated_at` text NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`org_id`) REFERENCES `organizations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`updated_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `members_job_created` ON `members` (`job_id`,`created_at`);--> statement-breakpoint
ALTER TABLE `jobs` ADD `adopted_code` text;