CREATE TABLE `climate_files` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`project_id` integer NOT NULL,
	`site_id` integer NOT NULL,
	`name` text NOT NULL,
	`original_file_name` text NOT NULL,
	`byte_size` integer NOT NULL,
	`sha256` text NOT NULL,
	`mapping_json` text NOT NULL,
	`report_json` text NOT NULL,
	`humidity_kind` text NOT NULL,
	`has_pressure` integer NOT NULL,
	`hours` integer NOT NULL,
	`measured_hours` integer NOT NULL,
	`filled_hours` integer NOT NULL,
	`missing_hours` integer NOT NULL,
	`first_hour_ms` integer NOT NULL,
	`last_hour_ms` integer NOT NULL,
	`created_by` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `climate_files_project_idx` ON `climate_files` (`project_id`);--> statement-breakpoint
CREATE INDEX `climate_files_site_idx` ON `climate_files` (`site_id`);--> statement-breakpoint
CREATE TABLE `climate_originals` (
	`climate_file_id` integer PRIMARY KEY NOT NULL,
	`bytes` blob NOT NULL,
	FOREIGN KEY (`climate_file_id`) REFERENCES `climate_files`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE TABLE `climate_series` (
	`climate_file_id` integer PRIMARY KEY NOT NULL,
	`timestamps_ms` blob NOT NULL,
	`dry_bulb_c` blob NOT NULL,
	`humidity` blob NOT NULL,
	`pressure_pa` blob,
	`flags` blob NOT NULL,
	FOREIGN KEY (`climate_file_id`) REFERENCES `climate_files`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE TABLE `sites` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`project_id` integer NOT NULL,
	`name` text NOT NULL,
	`latitude` real,
	`longitude` real,
	`elevation_m` real DEFAULT 0 NOT NULL,
	`time_zone` text DEFAULT 'UTC' NOT NULL,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `sites_project_idx` ON `sites` (`project_id`);