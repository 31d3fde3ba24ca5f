CREATE TABLE `reinspection_requests` (
	`id` int AUTO_INCREMENT NOT NULL,
	`machine_id` int NOT NULL,
	`based_on_report_id` int NOT NULL,
	`requester_id` varchar(36) NOT NULL,
	`order_id` int NOT NULL,
	`inspection_id` int,
	`status` enum('awaiting_payment','paid','delivered','refund_due','refunded','expired') NOT NULL DEFAULT 'awaiting_payment',
	`cancel_reason` text,
	`refund_attempts` smallint NOT NULL DEFAULT 0,
	`last_refund_error` text,
	`next_refund_attempt_at` datetime(3),
	`paid_at` datetime(3),
	`delivered_at` datetime(3),
	`refunded_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `reinspection_requests_id` PRIMARY KEY(`id`),
	CONSTRAINT `reinspection_requests_order_uq` UNIQUE(`order_id`)
);
--> statement-breakpoint
ALTER TABLE `orders` ADD `purpose` enum('report','reinspection') DEFAULT 'report' NOT NULL;--> statement-breakpoint
ALTER TABLE `reinspection_requests` ADD CONSTRAINT `reinspection_requests_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reinspection_requests` ADD CONSTRAINT `reinspection_requests_based_on_report_id_reports_id_fk` FOREIGN KEY (`based_on_report_id`) REFERENCES `reports`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reinspection_requests` ADD CONSTRAINT `reinspection_requests_requester_id_users_id_fk` FOREIGN KEY (`requester_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reinspection_requests` ADD CONSTRAINT `reinspection_requests_order_id_orders_id_fk` FOREIGN KEY (`order_id`) REFERENCES `orders`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reinspection_requests` ADD CONSTRAINT `reinspection_requests_inspection_id_inspections_id_fk` FOREIGN KEY (`inspection_id`) REFERENCES `inspections`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `reinspection_requests_machine_idx` ON `reinspection_requests` (`machine_id`,`status`);--> statement-breakpoint
CREATE INDEX `reinspection_requests_requester_idx` ON `reinspection_requests` (`requester_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `reinspection_requests_inspection_idx` ON `reinspection_requests` (`inspection_id`);--> statement-breakpoint
CREATE INDEX `reinspection_requests_refund_idx` ON `reinspection_requests` (`status`,`next_refund_attempt_at`);