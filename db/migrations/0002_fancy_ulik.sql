DROP INDEX `batches_match_idx`;--> statement-breakpoint
DROP INDEX `batches_team_idx`;--> statement-breakpoint
CREATE INDEX `batches_match_idx` ON `batches` (`match_id`,`team_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `batches_team_idx` ON `batches` (`team_id`,`created_at`);--> statement-breakpoint
DROP INDEX `matches_team_idx`;--> statement-breakpoint
CREATE INDEX `matches_draft_photo_idx` ON `matches` (`draft_photo_id`);--> statement-breakpoint
CREATE INDEX `matches_team_idx` ON `matches` (`team_id`,`updated_at`);--> statement-breakpoint
DROP INDEX `photos_team_idx`;--> statement-breakpoint
CREATE INDEX `photos_team_idx` ON `photos` (`team_id`,`created_at`);--> statement-breakpoint
DROP INDEX `pours_team_idx`;--> statement-breakpoint
CREATE INDEX `pours_submitted_idx` ON `pours` (`team_id`,`submitted_at`) WHERE "pours"."status" = 'submitted';--> statement-breakpoint
CREATE INDEX `pours_team_idx` ON `pours` (`team_id`,`created_at`);--> statement-breakpoint
DROP INDEX `samples_match_idx`;--> statement-breakpoint
CREATE INDEX `samples_team_purpose_idx` ON `samples` (`team_id`,`purpose`);--> statement-breakpoint
CREATE INDEX `samples_photo_idx` ON `samples` (`photo_id`);--> statement-breakpoint
CREATE INDEX `samples_match_idx` ON `samples` (`match_id`,`purpose`);--> statement-breakpoint
DROP INDEX `stock_movements_team_idx`;--> statement-breakpoint
CREATE INDEX `stock_movements_team_idx` ON `stock_movements` (`team_id`,`batch_id`);--> statement-breakpoint
CREATE INDEX `audit_events_entity_idx` ON `audit_events` (`team_id`,`entity_id`);--> statement-breakpoint
CREATE INDEX `sign_offs_pour_idx` ON `sign_offs` (`pour_id`);