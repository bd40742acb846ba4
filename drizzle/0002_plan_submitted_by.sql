ALTER TABLE `plan_revision` ADD `submitted_by` text REFERENCES user(id);--> statement-breakpoint
CREATE UNIQUE INDEX `plan_station_revision_uq` ON `plan_revision` (`station_id`,`revision`);