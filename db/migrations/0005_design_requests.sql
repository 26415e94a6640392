CREATE TABLE `attachments` (
	`id` text PRIMARY KEY NOT NULL,
	`request_id` text NOT NULL,
	`side` text NOT NULL,
	`purpose` text NOT NULL,
	`place` text NOT NULL,
	`caption` text NOT NULL,
	`message_id` text,
	`version` integer,
	`file_name` text NOT NULL,
	`mime_type` text NOT NULL,
	`size_bytes` integer NOT NULL,
	`storage_key` text NOT NULL,
	`sha256` text NOT NULL,
	`preview_key` text,
	`width_px` integer,
	`height_px` integer,
	`uploaded_by` text NOT NULL,
	`created_at` text NOT NULL,
	FOREIGN KEY (`request_id`) REFERENCES `design_requests`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`message_id`) REFERENCES `request_messages`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `attachments_request` ON `attachments` (`request_id`,`created_at`);--> statement-breakpoint
CREATE TABLE `design_request_versions` (
	`id` text PRIMARY KEY NOT NULL,
	`request_id` text NOT NULL,
	`version` integer NOT NULL,
	`snapshot` text NOT NULL,
	`changes` text NOT NULL,
	`note` text NOT NULL,
	`sent_by` text NOT NULL,
	`sent_at` text NOT NULL,
	FOREIGN KEY (`request_id`) REFERENCES `design_requests`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`sent_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `design_request_versions_request_version` ON `design_request_versions` (`request_id`,`version`);--> statement-breakpoint
CREATE TABLE `design_requests` (
	`id` text PRIMARY KEY NOT NULL,
	`org_id` text NOT NULL,
	`job_id` text NOT NULL,
	`number` integer NOT NULL,
	`created_by` text NOT NULL,
	`engineer_email` text,
	`engineer_user_id` text,
	`status` text NOT NULL,
	`draft` text NOT NULL,
	`version` integer NOT NULL,
	`fee_usd` integer,
	`turnaround_days` integer,
	`site_visit` integer,
	`fee_note` text,
	`fee_quoted_at` text,
	`fee_accepted_at` text,
	`decline_reason` text,
	`firm_unread` integer DEFAULT false NOT NULL,
	`engineer_unread` integer DEFAULT false NOT NULL,
	`created_at` text NOT NULL,
	`updated_at` text NOT NULL,
	`sent_at` text,
	FOREIGN KEY (`org_id`) REFERENCES `organizations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`engineer_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `design_requests_org_number` ON `design_requests` (`org_id`,`number`);--> statement-breakpoint
CREATE INDEX `design_requests_job` ON `design_requests` (`job_id`);--> statement-breakpoint
CREATE INDEX `design_requests_engineer` ON `design_requests` (`engineer_user_id`,`updated_at`);--> statement-breakpoint
CREATE TABLE `engineer_replies` (
	`id` text PRIMARY KEY NOT NULL,
	`request_id` text NOT NULL,
	`version` integer NOT NULL,
	`reply` text NOT NULL,
	`user_id` text NOT NULL,
	`created_at` text NOT NULL,
	FOREIGN KEY (`request_id`) REFERENCES `design_requests`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `engineer_replies_request` ON `engineer_replies` (`request_id`,`created_at`);--> statement-breakpoint
CREATE TABLE `request_invitations` (
	`id` text PRIMARY KEY NOT NULL,
	`request_id` text NOT NULL,
	`email` text NOT NULL,
	`token_hash` text NOT NULL,
	`created_at` text NOT NULL,
	`expires_at` text NOT NULL,
	`accepted_at` text,
	FOREIGN KEY (`request_id`) REFERENCES `design_requests`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `request_invitations_token_hash_unique` ON `request_invitations` (`token_hash`);--> statement-breakpoint
CREATE INDEX `request_invitations_request` ON `request_invitations` (`request_id`);--> statement-breakpoint
CREATE TABLE `request_messages` (
	`id` text PRIMARY KEY NOT NULL,
	`request_id` text NOT NULL,
	`kind` text NOT NULL,
	`side` text NOT NULL,
	`user_id` text NOT NULL,
	`body` text NOT NULL,
	`event` text,
	`version` integer NOT NULL,
	`created_at` text NOT NULL,
	FOREIGN KEY (`request_id`) REFERENCES `design_requests`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `request_messages_request` ON `request_messages` (`request_id`,`created_at`);