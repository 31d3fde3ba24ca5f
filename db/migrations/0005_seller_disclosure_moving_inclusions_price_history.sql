CREATE TABLE `machine_disclosures` (
	`machine_id` int NOT NULL,
	`known_faults` text NOT NULL,
	`repairs_and_rebuilds` text NOT NULL,
	`crashes_or_drops` text NOT NULL,
	`usage` enum('production','toolroom-or-maintenance','training','hobby','not-known') NOT NULL,
	`usage_notes` text NOT NULL,
	`supply_voltage` smallint,
	`supply_phases` smallint,
	`included` text NOT NULL,
	`sale_term` enum('as-is','tested-under-power','reconditioned','rebuilt') NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `machine_disclosures_machine_id` PRIMARY KEY(`machine_id`)
);
--> statement-breakpoint
CREATE TABLE `machine_moving_sheets` (
	`machine_id` int NOT NULL,
	`weight_kg` int NOT NULL,
	`length_mm` int,
	`width_mm` int,
	`height_mm` int,
	`heavy_end` enum('headstock','tailstock','even') NOT NULL DEFAULT 'headstock',
	`site_access` enum('ground-level-wide','narrow-door-or-steps','upper-floor-or-basement') NOT NULL,
	`access_notes` varchar(500),
	`removal_by` date,
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `machine_moving_sheets_machine_id` PRIMARY KEY(`machine_id`)
);
--> statement-breakpoint
CREATE TABLE `machine_inclusions` (
	`id` int AUTO_INCREMENT NOT NULL,
	`machine_id` int NOT NULL,
	`kind` enum('chuck','faceplate','steady-rest','travelling-rest','tool-post','collets','dro','manuals','other') NOT NULL,
	`description` varchar(200) NOT NULL,
	`condition` enum('good','usable','worn','missing') NOT NULL,
	`replacement_cost_minor` int,
	`currency` varchar(3) NOT NULL DEFAULT 'EUR',
	CONSTRAINT `machine_inclusions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `machine_price_changes` (
	`id` int AUTO_INCREMENT NOT NULL,
	`machine_id` int NOT NULL,
	`asking_price_minor` int,
	`currency` varchar(3) NOT NULL DEFAULT 'EUR',
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `machine_price_changes_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `buyer_shop_profiles` (
	`user_id` varchar(36) NOT NULL,
	`supply_voltage` smallint NOT NULL,
	`supply_phases` smallint NOT NULL,
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `buyer_shop_profiles_user_id` PRIMARY KEY(`user_id`)
);
--> statement-breakpoint
CREATE TABLE `report_settings` (
	`id` tinyint NOT NULL,
	`validity_days` smallint NOT NULL DEFAULT 90,
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `report_settings_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `machine_disclosures` ADD CONSTRAINT `machine_disclosures_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `machine_moving_sheets` ADD CONSTRAINT `machine_moving_sheets_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `machine_inclusions` ADD CONSTRAINT `machine_inclusions_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `machine_price_changes` ADD CONSTRAINT `machine_price_changes_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `buyer_shop_profiles` ADD CONSTRAINT `buyer_shop_profiles_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `machine_inclusions_machine_idx` ON `machine_inclusions` (`machine_id`);--> statement-breakpoint
CREATE INDEX `machine_price_changes_machine_idx` ON `machine_price_changes` (`machine_id`,`created_at`);