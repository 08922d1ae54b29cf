CREATE TABLE `sign_reviews` (
	`id` varchar(32) NOT NULL,
	`organisation_id` varchar(32) NOT NULL,
	`sign_id` varchar(32) NOT NULL,
	`revision` int NOT NULL,
	`content_hash` varchar(64) NOT NULL,
	`state` varchar(16) NOT NULL DEFAULT 'open',
	`note` text,
	`submitted_by` varchar(32),
	`submitted_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`closed_by` varchar(32),
	`closed_at` datetime(3),
	`decision_note` text,
	CONSTRAINT `sign_reviews_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `review_comments` (
	`id` varchar(32) NOT NULL,
	`organisation_id` varchar(32) NOT NULL,
	`sign_id` varchar(32) NOT NULL,
	`review_id` varchar(32),
	`revision` int NOT NULL,
	`parent_id` varchar(32),
	`x` double,
	`y` double,
	`body` text NOT NULL,
	`author_id` varchar(32),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `review_comments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sign_signoffs` (
	`id` varchar(32) NOT NULL,
	`organisation_id` varchar(32) NOT NULL,
	`sign_id` varchar(32) NOT NULL,
	`review_id` varchar(32),
	`revision` int NOT NULL,
	`content_hash` varchar(64) NOT NULL,
	`standard_id` varchar(32) NOT NULL,
	`engine_version` varchar(32) NOT NULL,
	`report` json NOT NULL,
	`fails` int NOT NULL,
	`advisory` int NOT NULL,
	`justification` text,
	`reviewer_id` varchar(32) NOT NULL,
	`reviewer_name` varchar(120) NOT NULL,
	`signed_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `sign_signoffs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `client_proofs` (
	`id` varchar(32) NOT NULL,
	`organisation_id` varchar(32) NOT NULL,
	`project_id` varchar(32) NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`email` varchar(254) NOT NULL,
	`message` text,
	`items` json NOT NULL,
	`created_by` varchar(32),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`expires_at` datetime(3) NOT NULL,
	`revoked_at` datetime(3),
	`decision` varchar(20),
	`answer_name` varchar(120),
	`answer_comment` text,
	`answered_at` datetime(3),
	CONSTRAINT `client_proofs_id` PRIMARY KEY(`id`),
	CONSTRAINT `client_proofs_token_uq` UNIQUE(`token_hash`)
);
--> statement-breakpoint
ALTER TABLE `sign_reviews` ADD CONSTRAINT `sign_reviews_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_reviews` ADD CONSTRAINT `sign_reviews_sign_id_signs_id_fk` FOREIGN KEY (`sign_id`) REFERENCES `signs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_reviews` ADD CONSTRAINT `sign_reviews_submitted_by_users_id_fk` FOREIGN KEY (`submitted_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_reviews` ADD CONSTRAINT `sign_reviews_closed_by_users_id_fk` FOREIGN KEY (`closed_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_comments` ADD CONSTRAINT `review_comments_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_comments` ADD CONSTRAINT `review_comments_sign_id_signs_id_fk` FOREIGN KEY (`sign_id`) REFERENCES `signs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `review_comments` ADD CONSTRAINT `review_comments_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_signoffs` ADD CONSTRAINT `sign_signoffs_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sign_signoffs` ADD CONSTRAINT `sign_signoffs_sign_id_signs_id_fk` FOREIGN KEY (`sign_id`) REFERENCES `signs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `client_proofs` ADD CONSTRAINT `client_proofs_organisation_id_organisations_id_fk` FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `client_proofs` ADD CONSTRAINT `client_proofs_project_id_projects_id_fk` FOREIGN KEY (`project_id`) REFERENCES `projects`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `client_proofs` ADD CONSTRAINT `client_proofs_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `sign_reviews_org_state_idx` ON `sign_reviews` (`organisation_id`,`state`);--> statement-breakpoint
CREATE INDEX `sign_reviews_sign_idx` ON `sign_reviews` (`sign_id`);--> statement-breakpoint
CREATE INDEX `review_comments_sign_idx` ON `review_comments` (`sign_id`);--> statement-breakpoint
CREATE INDEX `sign_signoffs_sign_idx` ON `sign_signoffs` (`sign_id`);--> statement-breakpoint
CREATE INDEX `client_proofs_project_idx` ON `client_proofs` (`project_id`);