CREATE TABLE `api_tokens` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`prefix` varchar(16) NOT NULL,
	`role` enum('technician','supervisor') NOT NULL,
	`created_by` varchar(36) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`last_used_at` datetime(3),
	`revoked_at` datetime(3),
	CONSTRAINT `api_tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `api_tokens_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `areas` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `areas_id` PRIMARY KEY(`id`),
	CONSTRAINT `areas_site_name` UNIQUE(`site_id`,`name`)
);
--> statement-breakpoint
CREATE TABLE `audit_log` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`actor_user_id` varchar(36),
	`actor_token_id` varchar(36),
	`action` varchar(80) NOT NULL,
	`entity_type` varchar(40) NOT NULL,
	`entity_id` varchar(64) NOT NULL,
	`before` json,
	`after` json,
	`at` datetime(3) NOT NULL,
	CONSTRAINT `audit_log_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `one_time_links` (
	`id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`purpose` enum('sign_in','invitation') NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `one_time_links_id` PRIMARY KEY(`id`),
	CONSTRAINT `one_time_links_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `rate_limits` (
	`bucket_key` varchar(191) NOT NULL,
	`hits` int NOT NULL,
	`window_ends_at` datetime(3) NOT NULL,
	CONSTRAINT `rate_limits_bucket_key` PRIMARY KEY(`bucket_key`)
);
--> statement-breakpoint
CREATE TABLE `sites` (
	`id` varchar(36) NOT NULL,
	`code` varchar(40) NOT NULL,
	`name` varchar(120) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `sites_id` PRIMARY KEY(`id`),
	CONSTRAINT `sites_code_unique` UNIQUE(`code`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`email` varchar(254) NOT NULL,
	`display_name` varchar(120) NOT NULL,
	`role` enum('technician','supervisor','admin') NOT NULL,
	`status` enum('invited','active','deactivated') NOT NULL,
	`password_hash` varchar(255),
	`session_version` int NOT NULL DEFAULT 1,
	`preferred_unit` enum('kJ/mol','kcal/mol','eV') NOT NULL DEFAULT 'kJ/mol',
	`created_at` datetime(3) NOT NULL,
	`last_sign_in_at` datetime(3),
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
ALTER TABLE `api_tokens` ADD CONSTRAINT `api_tokens_site_id_sites_id_fk` FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `api_tokens` ADD CONSTRAINT `api_tokens_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `areas` ADD CONSTRAINT `areas_site_id_sites_id_fk` FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `one_time_links` ADD CONSTRAINT `one_time_links_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `users` ADD CONSTRAINT `users_site_id_sites_id_fk` FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `api_tokens_site` ON `api_tokens` (`site_id`);--> statement-breakpoint
CREATE INDEX `audit_site_at` ON `audit_log` (`site_id`,`at`);--> statement-breakpoint
CREATE INDEX `audit_entity` ON `audit_log` (`entity_type`,`entity_id`);--> statement-breakpoint
CREATE INDEX `one_time_links_user` ON `one_time_links` (`user_id`);--> statement-breakpoint
CREATE INDEX `users_site` ON `users` (`site_id`);