ALTER TABLE `sync_changes` ADD `device_id` varchar(36);--> statement-breakpoint
CREATE INDEX `sync_changes_mutation` ON `sync_changes` (`mutation_id`);--> statement-breakpoint
CREATE INDEX `sync_changes_record` ON `sync_changes` (`record_id`,`revision`);