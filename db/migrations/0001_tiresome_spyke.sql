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
ALTER TABLE `samples` ADD `uncertainty` real;--> statement-breakpoint
ALTER TABLE `samples` ADD `de00_uncertainty` real;--> statement-breakpoint
ALTER TABLE `samples` ADD `shading` real;--> statement-breakpoint
ALTER TABLE `samples` ADD `other` text;--> statement-breakpoint
ALTER TABLE `samples` ADD `reference_shape` text;--> statement-breakpoint
ALTER TABLE `samples` ADD `in_frame` text;