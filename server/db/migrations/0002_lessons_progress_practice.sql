CREATE TABLE `lesson_progress` (
	`id` varchar(32) NOT NULL,
	`organisation_id` varchar(32) NOT NULL,
	`user_id` varchar(32) NOT NULL,
	`lesson_id` varchar(64) NOT NULL,
	`read_at` datetime(3) NOT NULL,
	CONSTRAINT `lesson_progress_id` PRIMARY KEY(`id`),
	CONSTRAINT `lesson_progress_user_lesson_uq` UNIQUE(`user_id`,`lesson_id`)
);
--> statement-breakpoint
CREATE TABLE `practice_copies` (
	`id` varchar(32) NOT NULL,
	`organisation_id` varchar(32) NOT NULL,
	`user_id` varchar(32) NOT NULL,
	`practice_id` varchar(64) NOT NULL,
	`document` json NOT NULL,
	`checks` int NOT NULL DEFAULT 0,
	`last_verdict` json,
	`last_checked_at` datetime(3),
	`solved_at` datetime(3),
	`version` int NOT NULL DEFAULT 1,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `practice_copies_id` PRIMARY KEY(`id`),
	CONSTRAINT `practice_copies_user_practice_uq` UNIQUE(`user_id`,`practice_id`)
);
--> statement-breakpoint
ALTER TABLE `lesson_progress` ADD CONSTRAINT `lesson_progress_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lesson_progress` ADD CONSTRAINT `lesson_progress_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `practice_copies` ADD CONSTRAINT `practice_copies_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `practice_copies` ADD CONSTRAINT `practice_copies_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `lesson_progress_org_idx` ON `lesson_progress` (`organisation_id`);--> statement-breakpoint
CREATE INDEX `practice_copies_org_idx` ON `practice_copies` (`organisation_id`);