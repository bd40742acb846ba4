ALTER TABLE `bundle_record` ADD `snapshot` text;--> statement-breakpoint
ALTER TABLE `bundle_record` ADD `survey_report` blob;--> statement-breakpoint
ALTER TABLE `bundle_record` ADD `started_at` integer;--> statement-breakpoint
ALTER TABLE `bundle_record` ADD `finished_at` integer;--> statement-breakpoint
ALTER TABLE `bundle_record` ADD `failure` text;--> statement-breakpoint
CREATE INDEX `bundle_record_site_idx` ON `bundle_record` (`site_id`);