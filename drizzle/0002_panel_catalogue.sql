CREATE TABLE `panel_products` (
	`id` varchar(36) NOT NULL,
	`organisation_id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`width_m` double NOT NULL,
	`length_m` double NOT NULL,
	`k_w_m2_per_kn` double NOT NULL,
	`n` double NOT NULL,
	`emissivity` double NOT NULL,
	`louver_min_deg` double,
	`louver_max_deg` double,
	`finish` enum('diffuse','specular'),
	`wall_emissivity` double,
	`created_by` varchar(36),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `panel_products_id` PRIMARY KEY(`id`),
	CONSTRAINT `panel_products_org_name_unique` UNIQUE(`organisation_id`,`name`)
);
--> statement-breakpoint
ALTER TABLE `panel_products` ADD CONSTRAINT `panel_products_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `panel_products` ADD CONSTRAINT `panel_products_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;