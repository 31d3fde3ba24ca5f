CREATE TABLE `shortlist_items` (
	`shortlist_id` int NOT NULL,
	`machine_id` int NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `shortlist_items_shortlist_id_machine_id_pk` PRIMARY KEY(`shortlist_id`,`machine_id`)
);
--> statement-breakpoint
CREATE TABLE `shortlists` (
	`id` int AUTO_INCREMENT NOT NULL,
	`owner_id` varchar(36) NOT NULL,
	`name` varchar(80) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `shortlists_id` PRIMARY KEY(`id`),
	CONSTRAINT `shortlists_owner_name_uq` UNIQUE(`owner_id`,`name`)
);
--> statement-breakpoint
ALTER TABLE `shortlist_items` ADD CONSTRAINT `shortlist_items_shortlist_id_shortlists_id_fk` FOREIGN KEY (`shortlist_id`) REFERENCES `shortlists`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `shortlist_items` ADD CONSTRAINT `shortlist_items_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `shortlists` ADD CONSTRAINT `shortlists_owner_id_users_id_fk` FOREIGN KEY (`owner_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `shortlist_items_machine_idx` ON `shortlist_items` (`machine_id`);