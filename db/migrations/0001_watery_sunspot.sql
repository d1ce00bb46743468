ALTER TABLE `samples` ADD `uncertainty` real;--> statement-breakpoint
ALTER TABLE `samples` ADD `de00_uncertainty` real;--> statement-breakpoint
ALTER TABLE `samples` ADD `shading` real;--> statement-breakpoint
ALTER TABLE `samples` ADD `other` text;--> statement-breakpoint
ALTER TABLE `samples` ADD `reference_shape` text;--> statement-breakpoint
ALTER TABLE `samples` ADD `in_frame` text;