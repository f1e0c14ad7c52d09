CREATE TABLE `share_links` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`project_id` integer NOT NULL,
	`token_hash` text NOT NULL,
	`target` text NOT NULL,
	`run_ids_json` text NOT NULL,
	`title` text NOT NULL,
	`public_until` integer,
	`created_by` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`revoked_at` integer,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `share_links_tokenHash_unique` ON `share_links` (`token_hash`);--> statement-breakpoint
CREATE INDEX `share_links_project_idx` ON `share_links` (`project_id`);--> statement-breakpoint
CREATE TABLE `sweeps` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`project_id` integer NOT NULL,
	`name` text NOT NULL,
	`base_scenario_id` integer,
	`climate_file_id` integer,
	`spec_json` text NOT NULL,
	`created_by` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`base_scenario_id`) REFERENCES `scenarios`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`climate_file_id`) REFERENCES `climate_files`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `sweeps_project_idx` ON `sweeps` (`project_id`);--> statement-breakpoint
ALTER TABLE `climate_files` ADD `parent_id` integer REFERENCES climate_files(id) ON DELETE set null;--> statement-breakpoint
ALTER TABLE `climate_files` ADD `derivation_json` text;--> statement-breakpoint
ALTER TABLE `runs` ADD `sweep_id` integer REFERENCES sweeps(id) ON DELETE cascade;--> statement-breakpoint
ALTER TABLE `runs` ADD `sweep_point_json` text;