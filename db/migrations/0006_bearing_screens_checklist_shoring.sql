CREATE TABLE `bearing_screen_versions` (
	`id` text PRIMARY KEY NOT NULL,
	`screen_id` text NOT NULL,
	`org_id` text NOT NULL,
	`version` integer NOT NULL,
	`wall_label` text NOT NULL,
	`answers` text NOT NULL,
	`outcome` text NOT NULL,
	`saved_by` text NOT NULL,
	`saved_at` text NOT NULL,
	FOREIGN KEY (`screen_id`) REFERENCES `bearing_screens`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`org_id`) REFERENCES `organizations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`saved_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `bearing_screen_versions_screen_version` ON `bearing_screen_versions` (`screen_id`,`version`);--> statement-breakpoint
CREATE TABLE `bearing_screens` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`org_id` text NOT NULL,
	`wall_label` text NOT NULL,
	`answers` text NOT NULL,
	`outcome` text NOT NULL,
	`result` text NOT NULL,
	`version` integer NOT NULL,
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
CREATE INDEX `bearing_screens_job_created` ON `bearing_screens` (`job_id`,`created_at`);--> statement-breakpoint
CREATE TABLE `job_checklist_items` (
	`job_id` text NOT NULL,
	`org_id` text NOT NULL,
	`item_key` text NOT NULL,
	`state` text NOT NULL,
	`note` text NOT NULL,
	`updated_by` text NOT NULL,
	`updated_at` text NOT NULL,
	PRIMARY KEY(`job_id`, `item_key`),
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`org_id`) REFERENCES `organizations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`updated_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE TABLE `shoring_plans` (
	`member_id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`org_id` text NOT NULL,
	`input` text NOT NULL,
	`result` text NOT NULL,
	`engine_version` text NOT NULL,
	`updated_by` text NOT NULL,
	`updated_at` text NOT NULL,
	FOREIGN KEY (`member_id`) REFERENCES `members`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`org_id`) REFERENCES `organizations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`updated_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
