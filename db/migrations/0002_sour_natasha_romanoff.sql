ALTER TABLE `matches` ADD `draft_photo_id` text REFERENCES photos(id);--> statement-breakpoint
ALTER TABLE `teams` ADD `time_zone` text DEFAULT 'UTC' NOT NULL;