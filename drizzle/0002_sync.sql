CREATE TABLE `bench_entries` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`author_id` varchar(36) NOT NULL,
	`content` json NOT NULL,
	`revision` int NOT NULL,
	`last_seq` bigint unsigned NOT NULL,
	`awaiting_review` boolean NOT NULL DEFAULT false,
	`updated_at` datetime(3) NOT NULL,
	`lot_ref` varchar(80),
	`sheet_id` varchar(36),
	`deleted` boolean NOT NULL,
	CONSTRAINT `bench_entries_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `photo_records` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`author_id` varchar(36) NOT NULL,
	`content` json NOT NULL,
	`revision` int NOT NULL,
	`last_seq` bigint unsigned NOT NULL,
	`awaiting_review` boolean NOT NULL DEFAULT false,
	`updated_at` datetime(3) NOT NULL,
	`bench_entry_id` varchar(36) NOT NULL,
	`blob_stored_at` datetime(3),
	CONSTRAINT `photo_records_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sheets` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`author_id` varchar(36) NOT NULL,
	`content` json NOT NULL,
	`revision` int NOT NULL,
	`last_seq` bigint unsigned NOT NULL,
	`awaiting_review` boolean NOT NULL DEFAULT false,
	`updated_at` datetime(3) NOT NULL,
	`kind` enum('cycle','dissolution','reaction','calorimetry') NOT NULL,
	`title` varchar(200) NOT NULL,
	`lot_ref` varchar(80),
	`area_id` varchar(36),
	`status` enum('draft','submitted','signed_off') NOT NULL,
	`pinned_edition_id` varchar(36),
	`sheet_version` int NOT NULL,
	`previous_version_id` varchar(36),
	`deleted` boolean NOT NULL,
	`server_result` json,
	`result_differs` boolean NOT NULL DEFAULT false,
	CONSTRAINT `sheets_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sync_changes` (
	`site_id` varchar(36) NOT NULL,
	`seq` bigint unsigned NOT NULL,
	`entity` enum('sheet','bench_entry','photo') NOT NULL,
	`record_id` varchar(36) NOT NULL,
	`revision` int NOT NULL,
	`cause` varchar(20) NOT NULL,
	`mutation_id` varchar(36),
	`actor_user_id` varchar(36),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `sync_changes_site_id_seq_pk` PRIMARY KEY(`site_id`,`seq`)
);
--> statement-breakpoint
CREATE TABLE `sync_conflict_versions` (
	`id` varchar(36) NOT NULL,
	`conflict_id` varchar(36) NOT NULL,
	`mutation_id` varchar(36) NOT NULL,
	`device_id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`base_revision` int NOT NULL,
	`content` json NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `sync_conflict_versions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sync_conflicts` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`entity` enum('sheet','bench_entry','photo') NOT NULL,
	`record_id` varchar(36) NOT NULL,
	`kind` enum('edit','drift') NOT NULL,
	`status` enum('open','resolved') NOT NULL,
	`server_revision` int NOT NULL,
	`server_content` json NOT NULL,
	`drift` json,
	`created_at` datetime(3) NOT NULL,
	`notified_at` datetime(3),
	`resolved_by` varchar(36),
	`resolved_at` datetime(3),
	`resolution` json,
	CONSTRAINT `sync_conflicts_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sync_devices` (
	`id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`last_seen_at` datetime(3) NOT NULL,
	CONSTRAINT `sync_devices_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sync_digest_throttle` (
	`site_id` varchar(36) NOT NULL,
	`last_sent_at` datetime(3) NOT NULL,
	CONSTRAINT `sync_digest_throttle_site_id` PRIMARY KEY(`site_id`)
);
--> statement-breakpoint
CREATE TABLE `sync_mutations` (
	`mutation_id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`device_id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`entity` enum('sheet','bench_entry','photo') NOT NULL,
	`record_id` varchar(36) NOT NULL,
	`status` enum('applied','conflict','rejected') NOT NULL,
	`revision` int,
	`conflict_id` varchar(36),
	`reason` json,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `sync_mutations_mutation_id` PRIMARY KEY(`mutation_id`)
);
--> statement-breakpoint
CREATE TABLE `sync_site_seq` (
	`site_id` varchar(36) NOT NULL,
	`seq` bigint unsigned NOT NULL,
	CONSTRAINT `sync_site_seq_site_id` PRIMARY KEY(`site_id`)
);
--> statement-breakpoint
CREATE INDEX `bench_site_seq` ON `bench_entries` (`site_id`,`last_seq`);--> statement-breakpoint
CREATE INDEX `bench_site_lot` ON `bench_entries` (`site_id`,`lot_ref`);--> statement-breakpoint
CREATE INDEX `photo_site_seq` ON `photo_records` (`site_id`,`last_seq`);--> statement-breakpoint
CREATE INDEX `photo_entry` ON `photo_records` (`bench_entry_id`);--> statement-breakpoint
CREATE INDEX `sheets_site_seq` ON `sheets` (`site_id`,`last_seq`);--> statement-breakpoint
CREATE INDEX `sheets_site_lot` ON `sheets` (`site_id`,`lot_ref`);--> statement-breakpoint
CREATE INDEX `sync_conflict_versions_conflict` ON `sync_conflict_versions` (`conflict_id`);--> statement-breakpoint
CREATE INDEX `sync_conflicts_site` ON `sync_conflicts` (`site_id`,`status`,`created_at`);--> statement-breakpoint
CREATE INDEX `sync_conflicts_record` ON `sync_conflicts` (`record_id`,`status`);--> statement-breakpoint
CREATE INDEX `sync_devices_user` ON `sync_devices` (`user_id`);--> statement-breakpoint
CREATE INDEX `sync_mutations_record` ON `sync_mutations` (`record_id`);