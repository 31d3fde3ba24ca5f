CREATE TABLE `workshops` (
	`id` int AUTO_INCREMENT NOT NULL,
	`name` varchar(160) NOT NULL,
	`town` varchar(120) NOT NULL,
	`region` varchar(120) NOT NULL,
	`postcode` varchar(20),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `workshops_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `accounts` (
	`user_id` varchar(36) NOT NULL,
	`type` varchar(255) NOT NULL,
	`provider` varchar(255) NOT NULL,
	`provider_account_id` varchar(255) NOT NULL,
	`refresh_token` text,
	`access_token` text,
	`expires_at` int,
	`token_type` varchar(255),
	`scope` varchar(255),
	`id_token` text,
	`session_state` varchar(255),
	CONSTRAINT `accounts_provider_provider_account_id_pk` PRIMARY KEY(`provider`,`provider_account_id`)
);
--> statement-breakpoint
CREATE TABLE `rate_limit_buckets` (
	`bucket_key` varchar(200) NOT NULL,
	`hits` int NOT NULL DEFAULT 0,
	`window_started_at` datetime(3) NOT NULL,
	`blocked_until` datetime(3),
	CONSTRAINT `rate_limit_buckets_bucket_key` PRIMARY KEY(`bucket_key`)
);
--> statement-breakpoint
CREATE TABLE `sessions` (
	`session_token` varchar(255) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`expires` datetime(3) NOT NULL,
	CONSTRAINT `sessions_session_token` PRIMARY KEY(`session_token`)
);
--> statement-breakpoint
CREATE TABLE `user_tokens` (
	`id` int AUTO_INCREMENT NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`purpose` enum('verify_email','reset_password','invitation') NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `user_tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `user_tokens_hash_uq` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` varchar(36) NOT NULL,
	`name` varchar(120),
	`email` varchar(254) NOT NULL,
	`email_verified` datetime(3),
	`image` varchar(500),
	`role` enum('seller','inspector','buyer','dealer','admin') NOT NULL,
	`password_hash` varchar(100),
	`workshop_id` int,
	`phone` varchar(40),
	`session_version` int NOT NULL DEFAULT 0,
	`deactivated_at` datetime(3),
	`invited_by_id` varchar(36),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_uq` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `verification_tokens` (
	`identifier` varchar(255) NOT NULL,
	`token` varchar(255) NOT NULL,
	`expires` datetime(3) NOT NULL,
	CONSTRAINT `verification_tokens_identifier_token_pk` PRIMARY KEY(`identifier`,`token`)
);
--> statement-breakpoint
CREATE TABLE `machines` (
	`id` int AUTO_INCREMENT NOT NULL,
	`seller_id` varchar(36) NOT NULL,
	`workshop_id` int,
	`machine_type` enum('centre_lathe') NOT NULL DEFAULT 'centre_lathe',
	`lathe_kind` enum('general_purpose','toolroom') NOT NULL DEFAULT 'general_purpose',
	`maker` varchar(120) NOT NULL,
	`model` varchar(120) NOT NULL,
	`serial_number` varchar(80),
	`year_built` smallint,
	`swing_mm` smallint NOT NULL,
	`between_centres_mm` smallint NOT NULL,
	`spindle_bore_mm` smallint,
	`motor_kw` decimal(5,2),
	`supply_voltage` smallint,
	`supply_phases` smallint,
	`size_class` enum('small','medium','large') NOT NULL,
	`town` varchar(120) NOT NULL,
	`region` varchar(120) NOT NULL,
	`asking_price_minor` int,
	`currency` varchar(3) NOT NULL DEFAULT 'EUR',
	`accessories` text,
	`description` text,
	`listing_status` enum('draft','listed','sold','withdrawn') NOT NULL DEFAULT 'draft',
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `machines_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `inspection_status_events` (
	`id` int AUTO_INCREMENT NOT NULL,
	`inspection_id` int NOT NULL,
	`from_status` enum('requested','booked','on_site','in_review','released','cancelled'),
	`to_status` enum('requested','booked','on_site','in_review','released','cancelled') NOT NULL,
	`actor_id` varchar(36),
	`note` text,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `inspection_status_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `inspections` (
	`id` int AUTO_INCREMENT NOT NULL,
	`machine_id` int NOT NULL,
	`requested_by_id` varchar(36) NOT NULL,
	`status` enum('requested','booked','on_site','in_review','released','cancelled') NOT NULL DEFAULT 'requested',
	`preferred_dates` json,
	`site_access_notes` text,
	`site_contact_name` varchar(120),
	`site_contact_phone` varchar(40),
	`inspector_id` varchar(36),
	`scheduled_at` datetime(3),
	`fee_minor` int,
	`currency` varchar(3) NOT NULL DEFAULT 'EUR',
	`reviewer_id` varchar(36),
	`cancel_reason` text,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `inspections_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `surveys` (
	`id` int AUTO_INCREMENT NOT NULL,
	`inspection_id` int NOT NULL,
	`format_version` int NOT NULL,
	`version` int NOT NULL DEFAULT 0,
	`data` json NOT NULL,
	`updated_by_id` varchar(36),
	`submitted_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `surveys_id` PRIMARY KEY(`id`),
	CONSTRAINT `surveys_inspection_uq` UNIQUE(`inspection_id`)
);
--> statement-breakpoint
CREATE TABLE `photos` (
	`id` int AUTO_INCREMENT NOT NULL,
	`machine_id` int,
	`inspection_id` int,
	`section` varchar(40),
	`caption` varchar(300),
	`file_key` varchar(200) NOT NULL,
	`original_url` varchar(500) NOT NULL,
	`display_key` varchar(200),
	`thumb_key` varchar(200),
	`width_px` int,
	`height_px` int,
	`bytes` int,
	`uploaded_by_id` varchar(36),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `photos_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `report_subsystem_scores` (
	`report_id` int NOT NULL,
	`subsystem` varchar(40) NOT NULL,
	`score` smallint,
	`grade` varchar(20),
	CONSTRAINT `report_subsystem_scores_report_id_subsystem_pk` PRIMARY KEY(`report_id`,`subsystem`)
);
--> statement-breakpoint
CREATE TABLE `reports` (
	`id` int AUTO_INCREMENT NOT NULL,
	`inspection_id` int NOT NULL,
	`machine_id` int NOT NULL,
	`version` int NOT NULL DEFAULT 1,
	`status` enum('draft','released','withdrawn') NOT NULL DEFAULT 'draft',
	`scoring_version` varchar(20) NOT NULL,
	`survey_format_version` int NOT NULL,
	`survey_version` int NOT NULL,
	`result` json NOT NULL,
	`overall_condition` enum('Excellent','Very good','Good','Fair','Poor','Salvage') NOT NULL,
	`overall_score` smallint NOT NULL,
	`confidence` decimal(4,3) NOT NULL,
	`safety_findings` smallint NOT NULL DEFAULT 0,
	`fair_market_value_minor` int,
	`repair_estimate_minor` int,
	`currency` varchar(3) NOT NULL DEFAULT 'EUR',
	`verification_code` varchar(24) NOT NULL,
	`inspector_id` varchar(36),
	`reviewer_id` varchar(36),
	`released_at` datetime(3),
	`withdrawn_at` datetime(3),
	`superseded_by_id` int,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `reports_id` PRIMARY KEY(`id`),
	CONSTRAINT `reports_verification_uq` UNIQUE(`verification_code`),
	CONSTRAINT `reports_inspection_version_uq` UNIQUE(`inspection_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `inspection_fees` (
	`id` int AUTO_INCREMENT NOT NULL,
	`machine_type` enum('centre_lathe') NOT NULL,
	`size_class` enum('small','medium','large') NOT NULL,
	`amount_minor` int NOT NULL,
	`currency` varchar(3) NOT NULL DEFAULT 'EUR',
	`updated_by_id` varchar(36),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `inspection_fees_id` PRIMARY KEY(`id`),
	CONSTRAINT `inspection_fees_class_uq` UNIQUE(`machine_type`,`size_class`)
);
--> statement-breakpoint
CREATE TABLE `orders` (
	`id` int AUTO_INCREMENT NOT NULL,
	`report_id` int NOT NULL,
	`buyer_id` varchar(36) NOT NULL,
	`amount_minor` int NOT NULL,
	`currency` varchar(3) NOT NULL DEFAULT 'EUR',
	`status` enum('pending','paid','refunded','expired') NOT NULL DEFAULT 'pending',
	`provider_checkout_session_id` varchar(255),
	`provider_payment_intent_id` varchar(255),
	`provider_refund_id` varchar(255),
	`refund_reason` text,
	`paid_at` datetime(3),
	`refunded_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `orders_id` PRIMARY KEY(`id`),
	CONSTRAINT `orders_checkout_session_uq` UNIQUE(`provider_checkout_session_id`)
);
--> statement-breakpoint
CREATE TABLE `payment_events` (
	`provider_event_id` varchar(255) NOT NULL,
	`type` varchar(100) NOT NULL,
	`provider_created_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `payment_events_provider_event_id` PRIMARY KEY(`provider_event_id`)
);
--> statement-breakpoint
CREATE TABLE `report_access_grants` (
	`id` int AUTO_INCREMENT NOT NULL,
	`report_id` int NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`reason` enum('purchase','owner','staff') NOT NULL,
	`order_id` int,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`revoked_at` datetime(3),
	CONSTRAINT `report_access_grants_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `comparable_sales` (
	`id` int AUTO_INCREMENT NOT NULL,
	`machine_type` enum('centre_lathe') NOT NULL,
	`description` varchar(200) NOT NULL,
	`year_built` smallint,
	`swing_mm` smallint NOT NULL,
	`between_centres_mm` smallint,
	`condition` enum('Excellent','Very good','Good','Fair','Poor','Salvage'),
	`sale_kind` enum('dealer_retail','private','auction','liquidation') NOT NULL,
	`price_minor` int NOT NULL,
	`currency` varchar(3) NOT NULL DEFAULT 'EUR',
	`sold_on` date NOT NULL,
	`region` varchar(120),
	`source` varchar(200),
	`created_by_id` varchar(36),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `comparable_sales_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `repair_cost_items` (
	`id` int AUTO_INCREMENT NOT NULL,
	`code` varchar(60) NOT NULL,
	`label` varchar(200) NOT NULL,
	`subsystem` varchar(40) NOT NULL,
	`cost_minor` int NOT NULL,
	`currency` varchar(3) NOT NULL DEFAULT 'EUR',
	`notes` text,
	`updated_by_id` varchar(36),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `repair_cost_items_id` PRIMARY KEY(`id`),
	CONSTRAINT `repair_cost_items_code_uq` UNIQUE(`code`)
);
--> statement-breakpoint
CREATE TABLE `audit_events` (
	`id` bigint AUTO_INCREMENT NOT NULL,
	`actor_id` varchar(36),
	`actor_role` varchar(20),
	`action` varchar(80) NOT NULL,
	`entity_type` varchar(40) NOT NULL,
	`entity_id` varchar(64),
	`outcome` varchar(20) NOT NULL DEFAULT 'ok',
	`detail` json,
	`ip_address` varchar(64),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `audit_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `email_outbox` (
	`id` bigint AUTO_INCREMENT NOT NULL,
	`to_address` varchar(254) NOT NULL,
	`template` varchar(60) NOT NULL,
	`subject` varchar(300) NOT NULL,
	`text_body` text NOT NULL,
	`html_body` text NOT NULL,
	`status` enum('pending','sending','sent','failed') NOT NULL DEFAULT 'pending',
	`attempts` int NOT NULL DEFAULT 0,
	`next_attempt_at` datetime(3) NOT NULL,
	`locked_until` datetime(3),
	`last_error` text,
	`sent_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `email_outbox_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `accounts` ADD CONSTRAINT `accounts_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sessions` ADD CONSTRAINT `sessions_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `user_tokens` ADD CONSTRAINT `user_tokens_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `users` ADD CONSTRAINT `users_workshop_id_workshops_id_fk` FOREIGN KEY (`workshop_id`) REFERENCES `workshops`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `machines` ADD CONSTRAINT `machines_seller_id_users_id_fk` FOREIGN KEY (`seller_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `machines` ADD CONSTRAINT `machines_workshop_id_workshops_id_fk` FOREIGN KEY (`workshop_id`) REFERENCES `workshops`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspection_status_events` ADD CONSTRAINT `inspection_status_events_inspection_id_inspections_id_fk` FOREIGN KEY (`inspection_id`) REFERENCES `inspections`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspection_status_events` ADD CONSTRAINT `inspection_status_events_actor_id_users_id_fk` FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspections` ADD CONSTRAINT `inspections_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspections` ADD CONSTRAINT `inspections_requested_by_id_users_id_fk` FOREIGN KEY (`requested_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspections` ADD CONSTRAINT `inspections_inspector_id_users_id_fk` FOREIGN KEY (`inspector_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspections` ADD CONSTRAINT `inspections_reviewer_id_users_id_fk` FOREIGN KEY (`reviewer_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `surveys` ADD CONSTRAINT `surveys_inspection_id_inspections_id_fk` FOREIGN KEY (`inspection_id`) REFERENCES `inspections`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `surveys` ADD CONSTRAINT `surveys_updated_by_id_users_id_fk` FOREIGN KEY (`updated_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_inspection_id_inspections_id_fk` FOREIGN KEY (`inspection_id`) REFERENCES `inspections`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_uploaded_by_id_users_id_fk` FOREIGN KEY (`uploaded_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `report_subsystem_scores` ADD CONSTRAINT `report_subsystem_scores_report_id_reports_id_fk` FOREIGN KEY (`report_id`) REFERENCES `reports`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reports` ADD CONSTRAINT `reports_inspection_id_inspections_id_fk` FOREIGN KEY (`inspection_id`) REFERENCES `inspections`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reports` ADD CONSTRAINT `reports_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reports` ADD CONSTRAINT `reports_inspector_id_users_id_fk` FOREIGN KEY (`inspector_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reports` ADD CONSTRAINT `reports_reviewer_id_users_id_fk` FOREIGN KEY (`reviewer_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `inspection_fees` ADD CONSTRAINT `inspection_fees_updated_by_id_users_id_fk` FOREIGN KEY (`updated_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `orders` ADD CONSTRAINT `orders_report_id_reports_id_fk` FOREIGN KEY (`report_id`) REFERENCES `reports`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `orders` ADD CONSTRAINT `orders_buyer_id_users_id_fk` FOREIGN KEY (`buyer_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `report_access_grants` ADD CONSTRAINT `report_access_grants_report_id_reports_id_fk` FOREIGN KEY (`report_id`) REFERENCES `reports`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `report_access_grants` ADD CONSTRAINT `report_access_grants_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `report_access_grants` ADD CONSTRAINT `report_access_grants_order_id_orders_id_fk` FOREIGN KEY (`order_id`) REFERENCES `orders`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `comparable_sales` ADD CONSTRAINT `comparable_sales_created_by_id_users_id_fk` FOREIGN KEY (`created_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `repair_cost_items` ADD CONSTRAINT `repair_cost_items_updated_by_id_users_id_fk` FOREIGN KEY (`updated_by_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `user_tokens_user_idx` ON `user_tokens` (`user_id`,`purpose`);--> statement-breakpoint
CREATE INDEX `users_role_idx` ON `users` (`role`);--> statement-breakpoint
CREATE INDEX `machines_seller_idx` ON `machines` (`seller_id`);--> statement-breakpoint
CREATE INDEX `machines_status_idx` ON `machines` (`listing_status`);--> statement-breakpoint
CREATE INDEX `machines_swing_idx` ON `machines` (`swing_mm`);--> statement-breakpoint
CREATE INDEX `machines_region_idx` ON `machines` (`region`);--> statement-breakpoint
CREATE INDEX `inspection_status_events_inspection_idx` ON `inspection_status_events` (`inspection_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `inspections_machine_idx` ON `inspections` (`machine_id`);--> statement-breakpoint
CREATE INDEX `inspections_status_idx` ON `inspections` (`status`,`scheduled_at`);--> statement-breakpoint
CREATE INDEX `inspections_inspector_idx` ON `inspections` (`inspector_id`,`scheduled_at`);--> statement-breakpoint
CREATE INDEX `photos_machine_idx` ON `photos` (`machine_id`);--> statement-breakpoint
CREATE INDEX `photos_inspection_idx` ON `photos` (`inspection_id`,`section`);--> statement-breakpoint
CREATE INDEX `report_subsystem_scores_idx` ON `report_subsystem_scores` (`subsystem`,`score`);--> statement-breakpoint
CREATE INDEX `reports_machine_idx` ON `reports` (`machine_id`,`status`);--> statement-breakpoint
CREATE INDEX `reports_released_idx` ON `reports` (`status`,`released_at`);--> statement-breakpoint
CREATE INDEX `reports_condition_idx` ON `reports` (`status`,`overall_score`);--> statement-breakpoint
CREATE INDEX `orders_buyer_idx` ON `orders` (`buyer_id`,`status`);--> statement-breakpoint
CREATE INDEX `orders_report_idx` ON `orders` (`report_id`);--> statement-breakpoint
CREATE INDEX `report_access_grants_user_idx` ON `report_access_grants` (`user_id`,`report_id`);--> statement-breakpoint
CREATE INDEX `report_access_grants_order_idx` ON `report_access_grants` (`order_id`);--> statement-breakpoint
CREATE INDEX `comparable_sales_size_idx` ON `comparable_sales` (`machine_type`,`swing_mm`);--> statement-breakpoint
CREATE INDEX `audit_events_actor_idx` ON `audit_events` (`actor_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `audit_events_entity_idx` ON `audit_events` (`entity_type`,`entity_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `audit_events_created_idx` ON `audit_events` (`created_at`);--> statement-breakpoint
CREATE INDEX `email_outbox_due_idx` ON `email_outbox` (`status`,`next_attempt_at`);