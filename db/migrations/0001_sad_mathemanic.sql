CREATE TABLE `stock_movements` (
	`id` text PRIMARY KEY NOT NULL,
	`team_id` text NOT NULL,
	`colorant_id` text NOT NULL,
	`kind` text NOT NULL,
	`amount` real NOT NULL,
	`balance` real NOT NULL,
	`batch_id` text,
	`pour_id` text,
	`note` text,
	`created_by` text,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`team_id`) REFERENCES `teams`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`colorant_id`) REFERENCES `colorants`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`batch_id`) REFERENCES `batches`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`pour_id`) REFERENCES `pours`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `stock_movements_colorant_idx` ON `stock_movements` (`colorant_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `stock_movements_team_idx` ON `stock_movements` (`team_id`);--> statement-breakpoint
CREATE TABLE `swatches` (
	`id` text PRIMARY KEY NOT NULL,
	`team_id` text NOT NULL,
	`colorant_id` text NOT NULL,
	`sample_id` text NOT NULL,
	`amount` real NOT NULL,
	`unit` text NOT NULL,
	`notes` text,
	`created_by` text,
	`created_at` integer DEFAULT (cast(unixepoch('subsec') * 1000 as integer)) NOT NULL,
	FOREIGN KEY (`team_id`) REFERENCES `teams`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`colorant_id`) REFERENCES `colorants`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`sample_id`) REFERENCES `samples`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `swatches_team_idx` ON `swatches` (`team_id`);--> statement-breakpoint
CREATE INDEX `swatches_colorant_idx` ON `swatches` (`colorant_id`);--> statement-breakpoint
ALTER TABLE `batches` ADD `zone_cups` text;--> statement-breakpoint
ALTER TABLE `batches` ADD `plan` text;--> statement-breakpoint
ALTER TABLE `batches` ADD `base_colorant_id` text REFERENCES colorants(id);--> statement-breakpoint
ALTER TABLE `colorants` ADD `low_stock_at` real;--> statement-breakpoint
ALTER TABLE `matches` ADD `draft_photo_id` text REFERENCES photos(id);--> statement-breakpoint
ALTER TABLE `samples` ADD `uncertainty` real;--> statement-breakpoint
ALTER TABLE `samples` ADD `de00_uncertainty` real;--> statement-breakpoint
ALTER TABLE `samples` ADD `shading` real;--> statement-breakpoint
ALTER TABLE `samples` ADD `other` text;--> statement-breakpoint
ALTER TABLE `samples` ADD `reference_shape` text;--> statement-breakpoint
ALTER TABLE `samples` ADD `in_frame` text;--> statement-breakpoint
ALTER TABLE `teams` ADD `currency` text DEFAULT 'USD' NOT NULL;--> statement-breakpoint
ALTER TABLE `teams` ADD `stock_draws_pours` integer DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `teams` ADD `time_zone` text DEFAULT 'UTC' NOT NULL;