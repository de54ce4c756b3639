CREATE TABLE `edition_value_events` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`edition_id` varchar(36) NOT NULL,
	`value_key` varchar(191) COLLATE utf8mb4_bin NOT NULL,
	`action` enum('added','changed','removed') NOT NULL,
	`before` json,
	`after` json,
	`origin` enum('editor','import','rebase','seed') NOT NULL,
	`actor_user_id` varchar(36),
	`at` datetime(3) NOT NULL,
	CONSTRAINT `edition_value_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `edition_values` (
	`id` varchar(36) NOT NULL,
	`edition_id` varchar(36) NOT NULL,
	`species_id` varchar(36) NOT NULL,
	`property` varchar(40) NOT NULL,
	`coordination` int,
	`value_key` varchar(191) COLLATE utf8mb4_bin NOT NULL,
	`value` varchar(40) NOT NULL,
	`uncertainty` varchar(40),
	`unit` varchar(24) NOT NULL,
	`structure` varchar(60),
	`scale` enum('conventional','absolute'),
	`source` text NOT NULL,
	`from_memory` boolean NOT NULL,
	`note` text,
	CONSTRAINT `edition_values_id` PRIMARY KEY(`id`),
	CONSTRAINT `edition_values_key` UNIQUE(`edition_id`,`value_key`)
);
--> statement-breakpoint
CREATE TABLE `editions` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`number` int NOT NULL,
	`state` enum('draft','in_review','in_force','retired') NOT NULL,
	`base_edition_id` varchar(36),
	`change_summary` text NOT NULL,
	`author_user_id` varchar(36) NOT NULL,
	`approver_user_id` varchar(36),
	`rejected_by_user_id` varchar(36),
	`rejection_reason` text,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	`submitted_at` datetime(3),
	`rejected_at` datetime(3),
	`in_force_at` datetime(3),
	`retired_at` datetime(3),
	`revision` int NOT NULL DEFAULT 1,
	`value_count` int NOT NULL DEFAULT 0,
	`content_hash` varchar(64),
	`in_force_slot` tinyint,
	CONSTRAINT `editions_id` PRIMARY KEY(`id`),
	CONSTRAINT `editions_site_number` UNIQUE(`site_id`,`number`),
	CONSTRAINT `editions_one_in_force` UNIQUE(`site_id`,`in_force_slot`)
);
--> statement-breakpoint
CREATE TABLE `ref_properties` (
	`code` varchar(40) NOT NULL,
	`label` varchar(120) NOT NULL,
	`unit` varchar(24) NOT NULL,
	`kind` varchar(24) NOT NULL,
	CONSTRAINT `ref_properties_code` PRIMARY KEY(`code`)
);
--> statement-breakpoint
CREATE TABLE `ref_species` (
	`id` varchar(36) NOT NULL,
	`formula` varchar(64) COLLATE utf8mb4_bin NOT NULL,
	`phase` enum('cr','l','g','aq') NOT NULL,
	`charge` int NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `ref_species_id` PRIMARY KEY(`id`),
	CONSTRAINT `ref_species_identity` UNIQUE(`formula`,`phase`,`charge`)
);
--> statement-breakpoint
ALTER TABLE `edition_value_events` ADD CONSTRAINT `edition_value_events_edition_id_editions_id_fk` FOREIGN KEY (`edition_id`) REFERENCES `editions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `edition_values` ADD CONSTRAINT `edition_values_edition_id_editions_id_fk` FOREIGN KEY (`edition_id`) REFERENCES `editions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `edition_values` ADD CONSTRAINT `edition_values_species_id_ref_species_id_fk` FOREIGN KEY (`species_id`) REFERENCES `ref_species`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `edition_values` ADD CONSTRAINT `edition_values_property_ref_properties_code_fk` FOREIGN KEY (`property`) REFERENCES `ref_properties`(`code`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `editions` ADD CONSTRAINT `editions_site_id_sites_id_fk` FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `editions` ADD CONSTRAINT `editions_author_user_id_users_id_fk` FOREIGN KEY (`author_user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `editions` ADD CONSTRAINT `editions_approver_user_id_users_id_fk` FOREIGN KEY (`approver_user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `editions` ADD CONSTRAINT `editions_rejected_by_user_id_users_id_fk` FOREIGN KEY (`rejected_by_user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `edition_value_events_edition` ON `edition_value_events` (`edition_id`);--> statement-breakpoint
CREATE INDEX `edition_value_events_key` ON `edition_value_events` (`site_id`,`value_key`);--> statement-breakpoint
CREATE INDEX `edition_values_value_key` ON `edition_values` (`value_key`);--> statement-breakpoint
CREATE INDEX `editions_site_state` ON `editions` (`site_id`,`state`);