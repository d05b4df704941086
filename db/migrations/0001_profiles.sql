CREATE TABLE `app_settings` (
	`key` varchar(64) NOT NULL,
	`value` json NOT NULL,
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `app_settings_key` PRIMARY KEY(`key`)
);
--> statement-breakpoint
CREATE TABLE `parameter_schemas` (
	`version` tinyint unsigned NOT NULL,
	`schema_id` varchar(191) NOT NULL,
	`title` varchar(191) NOT NULL,
	`schema` json NOT NULL,
	`schema_hash` char(64) NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `parameter_schemas_version` PRIMARY KEY(`version`),
	CONSTRAINT `parameter_schemas_schema_id_unique` UNIQUE(`schema_id`)
);
--> statement-breakpoint
CREATE TABLE `profile_revisions` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`profile_id` int unsigned NOT NULL,
	`number` int unsigned NOT NULL,
	`parent_revision_id` int unsigned,
	`schema_version` tinyint unsigned NOT NULL,
	`content` json NOT NULL,
	`content_hash` char(64) NOT NULL,
	`message` varchar(500) NOT NULL,
	`state` enum('draft','in_review','changes_requested','approved','withdrawn','superseded') NOT NULL DEFAULT 'draft',
	`safety_relevant` tinyint NOT NULL DEFAULT 0,
	`required_approvals` tinyint unsigned NOT NULL DEFAULT 1,
	`author_id` varchar(36),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`submitted_at` timestamp(3),
	`decided_at` timestamp(3),
	CONSTRAINT `profile_revisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `profile_revisions_number_uq` UNIQUE(`profile_id`,`number`)
);
--> statement-breakpoint
CREATE TABLE `profiles` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`layer` enum('base','site','controller') NOT NULL,
	`name` varchar(191) NOT NULL,
	`door_model_id` int unsigned,
	`site_id` int unsigned,
	`controller_serial` varchar(64),
	`schema_version` tinyint unsigned NOT NULL,
	`head_revision_id` int unsigned,
	`created_by` varchar(36),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `profiles_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `review_comments` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`revision_id` int unsigned NOT NULL,
	`author_id` varchar(36),
	`path` varchar(255) NOT NULL,
	`body` text NOT NULL,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `review_comments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `review_decisions` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`revision_id` int unsigned NOT NULL,
	`reviewer_id` varchar(36) NOT NULL,
	`decision` enum('approve','request_changes') NOT NULL,
	`content_hash` char(64) NOT NULL,
	`comment` text,
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `review_decisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `review_decisions_one_per_reviewer` UNIQUE(`revision_id`,`reviewer_id`)
);
--> statement-breakpoint
CREATE TABLE `safety_acknowledgements` (
	`id` int unsigned AUTO_INCREMENT NOT NULL,
	`revision_id` int unsigned NOT NULL,
	`rule_id` varchar(64) NOT NULL,
	`reason` varchar(1000) NOT NULL,
	`author_id` varchar(36),
	`created_at` timestamp(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `safety_acknowledgements_id` PRIMARY KEY(`id`),
	CONSTRAINT `safety_ack_uq` UNIQUE(`revision_id`,`rule_id`)
);
--> statement-breakpoint
ALTER TABLE `profile_revisions` ADD CONSTRAINT `profile_revisions_profile_id_profiles_id_fk` FOREIGN KEY (`profile_id`) REFERENCES `profiles`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `profile_revisions` ADD CONSTRAINT `profile_revisions_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `profiles` ADD CONSTRAINT `profiles_door_model_id_door_models_id_fk` FOREIGN KEY (`door_model_id`) REFERENCES `door_models`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `profiles` ADD CONSTRAINT `profiles_site_id_sites_id_fk` FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `profiles` ADD CONSTRAINT `profiles_schema_version_parameter_schemas_version_fk` FOREIGN KEY (`schema_version`) REFERENCES `parameter_schemas`(`version`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `profiles` ADD CONSTRAINT `profiles_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_comments` ADD CONSTRAINT `review_comments_revision_id_profile_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `profile_revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_comments` ADD CONSTRAINT `review_comments_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_decisions` ADD CONSTRAINT `review_decisions_revision_id_profile_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `profile_revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_decisions` ADD CONSTRAINT `review_decisions_reviewer_id_users_id_fk` FOREIGN KEY (`reviewer_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `safety_acknowledgements` ADD CONSTRAINT `safety_acknowledgements_revision_id_profile_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `profile_revisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `safety_acknowledgements` ADD CONSTRAINT `safety_acknowledgements_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `profile_revisions_state_idx` ON `profile_revisions` (`state`);--> statement-breakpoint
CREATE INDEX `profiles_door_model_idx` ON `profiles` (`door_model_id`);--> statement-breakpoint
CREATE INDEX `profiles_site_idx` ON `profiles` (`site_id`);--> statement-breakpoint
CREATE INDEX `review_comments_revision_idx` ON `review_comments` (`revision_id`);