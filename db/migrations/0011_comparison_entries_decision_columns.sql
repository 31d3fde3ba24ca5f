ALTER TABLE `comparison_entries` ADD `deal_breaker_count` smallint DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `comparison_entries` ADD `deal_breakers` varchar(255) DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE `comparison_entries` ADD `inclusions_value_minor` int;--> statement-breakpoint
ALTER TABLE `comparison_entries` ADD `missing_tooling_minor` int;--> statement-breakpoint
ALTER TABLE `comparison_entries` ADD `rigging_minor` int;--> statement-breakpoint
ALTER TABLE `comparison_entries` ADD `landed_base_minor` int DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `comparison_entries` ADD `supply_voltage` smallint;--> statement-breakpoint
ALTER TABLE `comparison_entries` ADD `supply_phases` smallint;--> statement-breakpoint
ALTER TABLE `comparison_entries` ADD `motor_kw` decimal(5,2);--> statement-breakpoint
ALTER TABLE `comparison_entries` ADD `listed_at` datetime(3) NOT NULL;--> statement-breakpoint
ALTER TABLE `comparison_entries` ADD `inspected_on` date NOT NULL;--> statement-breakpoint
CREATE INDEX `comparison_entries_listed_idx` ON `comparison_entries` (`listed_at`);--> statement-breakpoint
CREATE INDEX `comparison_entries_inspected_idx` ON `comparison_entries` (`inspected_on`);--> statement-breakpoint
CREATE INDEX `comparison_entries_deal_breakers_idx` ON `comparison_entries` (`deal_breaker_count`);--> statement-breakpoint
CREATE INDEX `comparison_entries_landed_idx` ON `comparison_entries` (`landed_base_minor`);--> statement-breakpoint
CREATE INDEX `comparison_entries_inclusions_idx` ON `comparison_entries` (`inclusions_value_minor`);