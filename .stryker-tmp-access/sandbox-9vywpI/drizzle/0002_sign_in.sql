CREATE TABLE `sign_in_attempts` (
	`state_hash` text PRIMARY KEY NOT NULL,
	`code_verifier` text NOT NULL,
	`nonce` text NOT NULL,
	`return_to` text NOT NULL,
	`created_at` integer NOT NULL,
	`expires_at` integer NOT NULL
);
--> statement-breakpoint
CREATE TABLE `audit_events` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`at` integer NOT NULL,
	`actor_id` integer,
	`actor_name` text,
	`project_id` integer,
	`project_name` text,
	`action` text NOT NULL,
	`target` text DEFAULT '' NOT NULL,
	`detail_json` text DEFAULT '{}' NOT NULL
);
--> statement-breakpoint
CREATE INDEX `audit_events_at_idx` ON `audit_events` (`at`);--> statement-breakpoint
CREATE INDEX `audit_events_project_idx` ON `audit_events` (`project_id`,`at`);--> statement-breakpoint
CREATE INDEX `audit_events_actor_idx` ON `audit_events` (`actor_id`,`at`);--> statement-breakpoint
CREATE TABLE `invites` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`project_id` integer NOT NULL,
	`email` text NOT NULL,
	`role` text NOT NULL,
	`token_id_hash` text NOT NULL,
	`invited_by` integer,
	`created_at` integer NOT NULL,
	`expires_at` integer NOT NULL,
	`accepted_at` integer,
	`accepted_by` integer,
	`revoked_at` integer,
	FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`invited_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`accepted_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `invites_project_idx` ON `invites` (`project_id`);--> statement-breakpoint
ALTER TABLE `users` ADD `oidc_issuer` text;--> statement-breakpoint
ALTER TABLE `users` ADD `oidc_subject` text;--> statement-breakpoint
ALTER TABLE `users` ADD `last_sign_in_at` integer;--> statement-breakpoint
ALTER TABLE `users` ADD `unit_system` text DEFAULT 'si' NOT NULL;--> statement-breakpoint
ALTER TABLE `users` ADD `run_notices` integer DEFAULT false NOT NULL;--> statement-breakpoint
CREATE UNIQUE INDEX `users_oidc_identity_unique` ON `users` (`oidc_issuer`,`oidc_subject`);--> statement-breakpoint
CREATE INDEX `sessions_user_idx` ON `sessions` (`user_id`);