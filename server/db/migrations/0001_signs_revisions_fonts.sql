CREATE TABLE `signs` (
	`id` varchar(32) NOT NULL,
	`organisation_id` varchar(32) NOT NULL,
	`project_id` varchar(32) NOT NULL,
	`name` varchar(200) NOT NULL,
	`sign_type` varchar(32) NOT NULL,
	`status` varchar(16) NOT NULL DEFAULT 'draft',
	`document` json NOT NULL,
	`current_revision` int NOT NULL DEFAULT 1,
	`schedule` json,
	`last_check` json,
	`last_editor_id` varchar(32),
	`version` int NOT NULL DEFAULT 1,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `signs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sign_revisions` (
	`id` varchar(32) NOT NULL,
	`sign_id` varchar(32) NOT NULL,
	`number` int NOT NULL,
	`document` json NOT NULL,
	`content_hash` varchar(64) NOT NULL,
	`author_id` varchar(32),
	`restored_from` int,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `sign_revisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `sign_revisions_sign_number_uq` UNIQUE(`sign_id`,`number`)
);
--> statement-breakpoint
CREATE TABLE `fonts` (
	`id` varchar(32) NOT NULL,
	`organisation_id` varchar(32) NOT NULL,
	`name` varchar(200) NOT NULL,
	`family` varchar(200) NOT NULL,
	`format` varchar(8) NOT NULL,
	`size` int NOT NULL,
	`sha256` varchar(64) NOT NULL,
	`file` mediumblob NOT NULL,
	`profile` json NOT NULL,
	`uploaded_by` varchar(32),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `fonts_id` PRIMARY KEY(`id`),
	CONSTRAINT `fonts_org_sha_uq` UNIQUE(`organisation_id`,`sha256`)
);
--> statement-breakpoint
ALTER TABLE `signs` ADD CONSTRAINT `signs_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `signs` ADD CONSTRAINT `signs_project_id_projects_id_fk` FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `signs` ADD CONSTRAINT `signs_last_editor_id_users_id_fk` FOREIGN KEY (`last_editor_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_revisions` ADD CONSTRAINT `sign_revisions_sign_id_signs_id_fk` FOREIGN KEY (`sign_id`) REFERENCES `signs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_revisions` ADD CONSTRAINT `sign_revisions_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `fonts` ADD CONSTRAINT `fonts_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `fonts` ADD CONSTRAINT `fonts_uploaded_by_users_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `signs_org_project_idx` ON `signs` (`organisation_id`,`project_id`);--> statement-breakpoint
CREATE INDEX `fonts_org_idx` ON `fonts` (`organisation_id`);