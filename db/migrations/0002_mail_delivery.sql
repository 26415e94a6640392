ALTER TABLE `mail_outbox` ADD `status` text DEFAULT 'sent' NOT NULL;--> statement-breakpoint
ALTER TABLE `mail_outbox` ADD `attempts` integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `mail_outbox` ADD `next_attempt_at` text;--> statement-breakpoint
ALTER TABLE `mail_outbox` ADD `last_error` text;--> statement-breakpoint
ALTER TABLE `mail_outbox` ADD `sent_at` text;--> statement-breakpoint
CREATE INDEX `mail_outbox_due` ON `mail_outbox` (`status`,`next_attempt_at`);