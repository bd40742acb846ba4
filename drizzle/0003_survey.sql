CREATE TABLE `survey_jack` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`site_id` integer NOT NULL,
	`ref` text NOT NULL,
	`label` text NOT NULL,
	`room` text DEFAULT '' NOT NULL,
	`station` text DEFAULT '' NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`site_id`) REFERENCES `site`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `survey_jack_site_ref_uq` ON `survey_jack` (`site_id`,`ref`);--> statement-breakpoint
CREATE TABLE `survey_node` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`site_id` integer NOT NULL,
	`ref` text NOT NULL,
	`kind` text NOT NULL,
	`label` text NOT NULL,
	`jack_id` integer,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`site_id`) REFERENCES `site`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`jack_id`) REFERENCES `survey_jack`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `survey_node_site_ref_uq` ON `survey_node` (`site_id`,`ref`);--> statement-breakpoint
CREATE TABLE `survey_pair_test` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`site_id` integer NOT NULL,
	`jack_id` integer NOT NULL,
	`pair` text NOT NULL,
	`vdc_volts` text,
	`vac_volts` text,
	`continuity` text,
	`tested_by` text,
	`tested_by_name` text DEFAULT '' NOT NULL,
	`tested_at` integer NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`site_id`) REFERENCES `site`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`jack_id`) REFERENCES `survey_jack`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`tested_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `survey_pair_test_jack_idx` ON `survey_pair_test` (`jack_id`);--> statement-breakpoint
CREATE TABLE `survey_run` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`site_id` integer NOT NULL,
	`ref` text NOT NULL,
	`from_node_id` integer NOT NULL,
	`to_node_id` integer NOT NULL,
	`length_ft` real NOT NULL,
	`gauge` integer NOT NULL,
	`reverses` integer NOT NULL,
	`kind` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`site_id`) REFERENCES `site`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`from_node_id`) REFERENCES `survey_node`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`to_node_id`) REFERENCES `survey_node`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `survey_run_site_ref_uq` ON `survey_run` (`site_id`,`ref`);--> statement-breakpoint
CREATE TABLE `survey_settings` (
	`site_id` integer PRIMARY KEY NOT NULL,
	`centre_node_id` integer,
	`network_pair` text DEFAULT '' NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`site_id`) REFERENCES `site`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`centre_node_id`) REFERENCES `survey_node`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE TABLE `survey_terminator` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`site_id` integer NOT NULL,
	`node_id` integer NOT NULL,
	`ohms` real NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`site_id`) REFERENCES `site`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`node_id`) REFERENCES `survey_node`(`id`) ON UPDATE no action ON DELETE no action
);
