CREATE TABLE `calibration_runs` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`controller_id` int unsigned NOT NULL,
	`file_name` varchar(191) NOT NULL,
	`csv` mediumtext NOT NULL,
	`analysis` json NOT NULL,
	`uploaded_by` varchar(36),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `calibration_runs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `check_ins` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`controller_id` int unsigned NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`applied_hash` char(64),
	`refused_reason` varchar(500),
	`firmware_version` varchar(32) NOT NULL,
	`uptime_s` int unsigned NOT NULL,
	`door_cycles` int unsigned NOT NULL,
	`last_open_counts` int unsigned,
	`last_close_counts` int unsigned,
	`last_travel_ms` int unsigned,
	`stall_events` int unsigned NOT NULL,
	`time_fix_age_s` int unsigned,
	CONSTRAINT `check_ins_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `controller_tokens` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`controller_id` int unsigned NOT NULL,
	`token_hash` char(64) NOT NULL,
	`hint` varchar(8) NOT NULL,
	`created_by` varchar(36),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`revoked_at` timestamp(3),
	CONSTRAINT `controller_tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `controller_tokens_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `controllers` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`serial` varchar(32) NOT NULL,
	`door_model_id` int unsigned NOT NULL,
	`site_id` int unsigned NOT NULL,
	`firmware_version` varchar(32) NOT NULL,
	`parameter_set_version` tinyint unsigned NOT NULL,
	`running_hash` char(64),
	`last_seen_at` timestamp(3),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `controllers_id` PRIMARY KEY(`id`),
	CONSTRAINT `controllers_serial_unique` UNIQUE(`serial`)
);
--> statement-breakpoint
CREATE TABLE `releases` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`base_revision_id` int unsigned NOT NULL,
	`door_model_id` int unsigned NOT NULL,
	`overlay_revision_ids` json NOT NULL,
	`target_kind` enum('door_model','site','controllers') NOT NULL,
	`target_site_id` int unsigned,
	`target_serials` json,
	`percent` tinyint unsigned NOT NULL,
	`state` enum('active','paused','rolled_back') NOT NULL DEFAULT 'active',
	`note` varchar(500),
	`created_by` varchar(36),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `releases_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `calibration_runs` ADD CONSTRAINT `calibration_runs_controller_id_controllers_id_fk` FOREIGN KEY (`controller_id`) REFERENCES `controllers`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `calibration_runs` ADD CONSTRAINT `calibration_runs_uploaded_by_users_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `check_ins` ADD CONSTRAINT `check_ins_controller_id_controllers_id_fk` FOREIGN KEY (`controller_id`) REFERENCES `controllers`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `controller_tokens` ADD CONSTRAINT `controller_tokens_controller_id_controllers_id_fk` FOREIGN KEY (`controller_id`) REFERENCES `controllers`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `controller_tokens` ADD CONSTRAINT `controller_tokens_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `controllers` ADD CONSTRAINT `controllers_door_model_id_door_models_id_fk` FOREIGN KEY (`door_model_id`) REFERENCES `door_models`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `controllers` ADD CONSTRAINT `controllers_site_id_sites_id_fk` FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `releases` ADD CONSTRAINT `releases_base_revision_id_profile_revisions_id_fk` FOREIGN KEY (`base_revision_id`) REFERENCES `profile_revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `releases` ADD CONSTRAINT `releases_door_model_id_door_models_id_fk` FOREIGN KEY (`door_model_id`) REFERENCES `door_models`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `releases` ADD CONSTRAINT `releases_target_site_id_sites_id_fk` FOREIGN KEY (`target_site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `releases` ADD CONSTRAINT `releases_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `check_ins_controller_idx` ON `check_ins` (`controller_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `controller_tokens_controller_idx` ON `controller_tokens` (`controller_id`);--> statement-breakpoint
CREATE INDEX `controllers_site_idx` ON `controllers` (`site_id`);--> statement-breakpoint
CREATE INDEX `controllers_model_idx` ON `controllers` (`door_model_id`);--> statement-breakpoint
CREATE INDEX `releases_model_idx` ON `releases` (`door_model_id`,`state`);