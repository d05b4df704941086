CREATE TABLE `accounts` (
	`id` varchar(36) NOT NULL,
	`account_id` varchar(191) NOT NULL,
	`provider_id` varchar(64) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`access_token` text,
	`refresh_token` text,
	`id_token` text,
	`access_token_expires_at` timestamp(3),
	`refresh_token_expires_at` timestamp(3),
	`scope` text,
	`password` text,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `accounts_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sessions` (
	`id` varchar(36) NOT NULL,
	`expires_at` timestamp(3) NOT NULL,
	`token` varchar(191) NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`ip_address` varchar(64),
	`user_agent` text,
	`user_id` varchar(36) NOT NULL,
	`impersonated_by` varchar(36),
	CONSTRAINT `sessions_id` PRIMARY KEY(`id`),
	CONSTRAINT `sessions_token_unique` UNIQUE(`token`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` varchar(36) NOT NULL,
	`name` varchar(191) NOT NULL,
	`email` varchar(191) NOT NULL,
	`email_verified` boolean NOT NULL DEFAULT false,
	`image` text,
	`role` varchar(32) NOT NULL DEFAULT 'viewer',
	`banned` boolean DEFAULT false,
	`ban_reason` text,
	`ban_expires` timestamp(3),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `verifications` (
	`id` varchar(36) NOT NULL,
	`identifier` varchar(191) NOT NULL,
	`value` text NOT NULL,
	`expires_at` timestamp(3) NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `verifications_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `captured_mails` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`envelope_from` varchar(191) NOT NULL,
	`envelope_to` varchar(1000) NOT NULL,
	`subject` varchar(255) NOT NULL,
	`text_body` mediumtext NOT NULL,
	`html_body` mediumtext,
	`received_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `captured_mails_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `mail_outbox` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`kind` enum('invitation','password_reset','notice') NOT NULL,
	`to_address` varchar(191) NOT NULL,
	`subject` varchar(255) NOT NULL,
	`text_body` mediumtext NOT NULL,
	`html_body` mediumtext,
	`status` enum('queued','sent','failed') NOT NULL DEFAULT 'queued',
	`attempts` int NOT NULL DEFAULT 0,
	`last_error` text,
	`next_attempt_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`sent_at` timestamp(3),
	CONSTRAINT `mail_outbox_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `door_models` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`code` varchar(32) NOT NULL,
	`name` varchar(191) NOT NULL,
	`door_width_mm` int NOT NULL,
	`door_travel_mm` int NOT NULL,
	`spool_diameter_mm` decimal(6,2) NOT NULL,
	`cord_diameter_mm` decimal(5,2) NOT NULL,
	`gearbox_ratio` decimal(8,2) NOT NULL,
	`encoder_pulses_per_rev` int NOT NULL,
	`encoder_decoding` enum('x1','x2','x4') NOT NULL,
	`motor_no_load_rpm` int NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `door_models_id` PRIMARY KEY(`id`),
	CONSTRAINT `door_models_code_unique` UNIQUE(`code`)
);
--> statement-breakpoint
CREATE TABLE `sites` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`slug` varchar(64) NOT NULL,
	`name` varchar(191) NOT NULL,
	`latitude` decimal(9,6) NOT NULL,
	`longitude` decimal(9,6) NOT NULL,
	`time_zone` varchar(64) NOT NULL,
	`contact_name` varchar(191),
	`contact_email` varchar(191),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `sites_id` PRIMARY KEY(`id`),
	CONSTRAINT `sites_slug_unique` UNIQUE(`slug`)
);
--> statement-breakpoint
CREATE TABLE `audit_events` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`actor_id` varchar(36),
	`action` varchar(64) NOT NULL,
	`subject_type` varchar(32) NOT NULL,
	`subject_id` varchar(64) NOT NULL,
	`detail` json,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `audit_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `accounts` ADD CONSTRAINT `accounts_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sessions` ADD CONSTRAINT `sessions_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `audit_events` ADD CONSTRAINT `audit_events_actor_id_users_id_fk` FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `accounts_user_id_idx` ON `accounts` (`user_id`);--> statement-breakpoint
CREATE INDEX `sessions_user_id_idx` ON `sessions` (`user_id`);--> statement-breakpoint
CREATE INDEX `verifications_identifier_idx` ON `verifications` (`identifier`);--> statement-breakpoint
CREATE INDEX `captured_mails_received_idx` ON `captured_mails` (`received_at`);--> statement-breakpoint
CREATE INDEX `mail_outbox_status_idx` ON `mail_outbox` (`status`,`next_attempt_at`);--> statement-breakpoint
CREATE INDEX `audit_events_created_idx` ON `audit_events` (`created_at`);