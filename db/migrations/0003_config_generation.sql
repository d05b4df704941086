CREATE TABLE `config_generation` (
	`id` tinyint unsigned NOT NULL,
	`generation` bigint unsigned NOT NULL,
	CONSTRAINT `config_generation_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
INSERT INTO `config_generation` (`id`, `generation`) VALUES (1, 0);
