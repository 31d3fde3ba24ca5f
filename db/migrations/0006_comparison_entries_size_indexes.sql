CREATE INDEX `comparison_entries_swing_idx` ON `comparison_entries` (`swing_mm`);--> statement-breakpoint
CREATE INDEX `comparison_entries_centres_idx` ON `comparison_entries` (`between_centres_mm`);