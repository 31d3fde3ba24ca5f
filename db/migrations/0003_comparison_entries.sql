CREATE TABLE `comparison_entries` (
	`report_id` int NOT NULL,
	`inspection_id` int NOT NULL,
	`machine_id` int NOT NULL,
	`maker` varchar(120) NOT NULL,
	`model` varchar(120) NOT NULL,
	`lathe_kind` enum('general_purpose','toolroom') NOT NULL,
	`swing_mm` smallint NOT NULL,
	`between_centres_mm` smallint NOT NULL,
	`year_built` smallint,
	`town` varchar(120) NOT NULL,
	`region` varchar(120) NOT NULL,
	`asking_price_minor` int,
	`price_currency` varchar(3) NOT NULL,
	`overall_condition` enum('Excellent','Very good','Good','Fair','Poor','Salvage') NOT NULL,
	`overall_score` smallint NOT NULL,
	`confidence` decimal(4,3) NOT NULL,
	`fair_market_value_minor` int,
	`repair_estimate_minor` int,
	`value_currency` varchar(3) NOT NULL,
	`released_at` datetime(3),
	`bed_score` smallint,
	`bed_grade` enum('Excellent','Very good','Good','Fair','Poor','Salvage'),
	`spindle_score` smallint,
	`spindle_grade` enum('Excellent','Very good','Good','Fair','Poor','Salvage'),
	`gearbox_score` smallint,
	`gearbox_grade` enum('Excellent','Very good','Good','Fair','Poor','Salvage'),
	`slides_score` smallint,
	`slides_grade` enum('Excellent','Very good','Good','Fair','Poor','Salvage'),
	`tailstock_score` smallint,
	`tailstock_grade` enum('Excellent','Very good','Good','Fair','Poor','Salvage'),
	`drive_score` smallint,
	`drive_grade` enum('Excellent','Very good','Good','Fair','Poor','Salvage'),
	`electrical_score` smallint,
	`electrical_grade` enum('Excellent','Very good','Good','Fair','Poor','Salvage'),
	`accessories_score` smallint,
	`accessories_grade` enum('Excellent','Very good','Good','Fair','Poor','Salvage'),
	CONSTRAINT `comparison_entries_report_id` PRIMARY KEY(`report_id`)
);
--> statement-breakpoint
CREATE INDEX `comparison_entries_score_idx` ON `comparison_entries` (`overall_score`);--> statement-breakpoint
CREATE INDEX `comparison_entries_released_idx` ON `comparison_entries` (`released_at`);--> statement-breakpoint
CREATE INDEX `comparison_entries_machine_idx` ON `comparison_entries` (`machine_id`);--> statement-breakpoint
CREATE INDEX `comparison_entries_inspection_idx` ON `comparison_entries` (`inspection_id`);