CREATE TABLE `invitations` (
	`id` int AUTO_INCREMENT NOT NULL,
	`user_id` int NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`invited_by` int,
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `invitations_id` PRIMARY KEY(`id`),
	CONSTRAINT `invitations_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `machine_tokens` (
	`id` int AUTO_INCREMENT NOT NULL,
	`name` varchar(120) NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`scopes` json NOT NULL,
	`created_by` int,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`last_used_at` datetime(3),
	`revoked_at` datetime(3),
	CONSTRAINT `machine_tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `machine_tokens_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `sign_in_failures` (
	`id` int AUTO_INCREMENT NOT NULL,
	`throttle_key` varchar(400) NOT NULL,
	`at` datetime(3) NOT NULL,
	CONSTRAINT `sign_in_failures_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `user_roles` (
	`user_id` int NOT NULL,
	`role` enum('shift_crew','detector_expert','analysis_convener','safety_officer','admin') NOT NULL,
	`granted_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `user_roles_user_id_role_pk` PRIMARY KEY(`user_id`,`role`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` int AUTO_INCREMENT NOT NULL,
	`email` varchar(320) NOT NULL,
	`display_name` varchar(120) NOT NULL,
	`password_hash` varchar(100),
	`active` boolean NOT NULL DEFAULT true,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `audit_events` (
	`id` bigint AUTO_INCREMENT NOT NULL,
	`actor_user_id` int,
	`actor_token_id` int,
	`action` varchar(80) NOT NULL,
	`record_type` varchar(60) NOT NULL,
	`record_id` varchar(60) NOT NULL,
	`details` json,
	`at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `audit_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `detector_configs` (
	`id` int AUTO_INCREMENT NOT NULL,
	`detector` varchar(60) NOT NULL,
	`name` varchar(120) NOT NULL,
	`target_material` varchar(60) NOT NULL,
	`fiducial_mass_kg` decimal(12,4) NOT NULL,
	`effective_from` datetime(3) NOT NULL,
	`notes` text,
	`created_by` int,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `detector_configs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `runs` (
	`id` int AUTO_INCREMENT NOT NULL,
	`number` int NOT NULL,
	`type` enum('science','calibration','background','noise','commissioning') NOT NULL,
	`status` enum('running','ended','aborted') NOT NULL DEFAULT 'running',
	`start_at` datetime(3) NOT NULL,
	`end_at` datetime(3),
	`live_seconds` decimal(14,3),
	`dead_seconds` decimal(14,3),
	`trigger_count` bigint,
	`config_id` int NOT NULL,
	`target_mass_override_kg` decimal(12,4),
	`conditions` json NOT NULL,
	`opened_by_user_id` int,
	`opened_by_token_id` int,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `runs_id` PRIMARY KEY(`id`),
	CONSTRAINT `runs_number_unique` UNIQUE(`number`)
);
--> statement-breakpoint
CREATE TABLE `attachments` (
	`id` int AUTO_INCREMENT NOT NULL,
	`entry_id` int NOT NULL,
	`object_key` varchar(200) NOT NULL,
	`file_name` varchar(255) NOT NULL,
	`content_type` varchar(100) NOT NULL,
	`size_bytes` bigint NOT NULL,
	`state` enum('pending','stored','failed') NOT NULL DEFAULT 'pending',
	`failure_reason` varchar(300),
	`uploaded_by` int NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `attachments_id` PRIMARY KEY(`id`),
	CONSTRAINT `attachments_object_key_unique` UNIQUE(`object_key`)
);
--> statement-breakpoint
CREATE TABLE `entries` (
	`id` int AUTO_INCREMENT NOT NULL,
	`category` enum('shift_summary','run_note','detector','cryogenics','radiation','daq_computing','calibration','maintenance','incident') NOT NULL,
	`author_id` int NOT NULL,
	`current_revision` int NOT NULL DEFAULT 1,
	`needs_safety_review` boolean NOT NULL DEFAULT false,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`retracted_at` datetime(3),
	`retracted_by` int,
	`retract_reason` text,
	CONSTRAINT `entries_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `entry_revisions` (
	`id` int AUTO_INCREMENT NOT NULL,
	`entry_id` int NOT NULL,
	`revision` int NOT NULL,
	`title` varchar(200) NOT NULL,
	`body` mediumtext NOT NULL,
	`tags` json NOT NULL,
	`run_numbers` json NOT NULL,
	`author_id` int NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`is_current` boolean NOT NULL DEFAULT true,
	CONSTRAINT `entry_revisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `entry_revisions_entry_rev_uq` UNIQUE(`entry_id`,`revision`)
);
--> statement-breakpoint
CREATE TABLE `entry_runs` (
	`entry_id` int NOT NULL,
	`run_number` int NOT NULL,
	CONSTRAINT `entry_runs_entry_id_run_number_pk` PRIMARY KEY(`entry_id`,`run_number`)
);
--> statement-breakpoint
CREATE TABLE `entry_tags` (
	`entry_id` int NOT NULL,
	`tag` varchar(60) NOT NULL,
	CONSTRAINT `entry_tags_entry_id_tag_pk` PRIMARY KEY(`entry_id`,`tag`)
);
--> statement-breakpoint
CREATE TABLE `bad_time_flags` (
	`id` int AUTO_INCREMENT NOT NULL,
	`start_at` datetime(3) NOT NULL,
	`end_at` datetime(3) NOT NULL,
	`subsystem` varchar(40) NOT NULL,
	`verdict` enum('exclude','caution') NOT NULL,
	`reason` text NOT NULL,
	`state` enum('proposed','confirmed','withdrawn') NOT NULL DEFAULT 'proposed',
	`proposed_by` int NOT NULL,
	`proposed_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`confirmed_by` int,
	`confirmed_at` datetime(3),
	`withdrawn_by` int,
	`withdrawn_at` datetime(3),
	`withdraw_reason` text,
	CONSTRAINT `bad_time_flags_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `dq_periods` (
	`id` int AUTO_INCREMENT NOT NULL,
	`name` varchar(120) NOT NULL,
	`start_at` datetime(3) NOT NULL,
	`end_at` datetime(3) NOT NULL,
	`run_types` json NOT NULL,
	`signal_acceptance` double NOT NULL,
	`notes` text,
	`blind` boolean NOT NULL DEFAULT false,
	`observed_count` int,
	`expected_background` double,
	`background_note` text,
	`confidence_level` double NOT NULL DEFAULT 0.9,
	`limit_method` enum('classical','fc','bayes') NOT NULL DEFAULT 'fc',
	`unblinded_at` datetime(3),
	`unblinded_by` int,
	`created_by` int,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `dq_periods_id` PRIMARY KEY(`id`),
	CONSTRAINT `dq_periods_name_unique` UNIQUE(`name`)
);
--> statement-breakpoint
CREATE TABLE `flag_events` (
	`id` int AUTO_INCREMENT NOT NULL,
	`flag_id` int NOT NULL,
	`action` varchar(30) NOT NULL,
	`actor_id` int NOT NULL,
	`comment` text,
	`at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `flag_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `subsystems` (
	`code` varchar(40) NOT NULL,
	`label` varchar(80) NOT NULL,
	`active` boolean NOT NULL DEFAULT true,
	CONSTRAINT `subsystems_code` PRIMARY KEY(`code`)
);
--> statement-breakpoint
CREATE TABLE `calibration_sources` (
	`id` int AUTO_INCREMENT NOT NULL,
	`nuclide` varchar(20) NOT NULL,
	`serial` varchar(60) NOT NULL,
	`form` enum('sealed','gaseous') NOT NULL,
	`reference_activity_bq` double NOT NULL,
	`reference_date` datetime(3) NOT NULL,
	`location` varchar(120) NOT NULL,
	`custodian_id` int,
	`allowed_out_hours` double NOT NULL,
	`leak_test_interval_months` int,
	`last_leak_test_at` datetime(3),
	`decay_wait_fraction` double,
	`notes` text,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `calibration_sources_id` PRIMARY KEY(`id`),
	CONSTRAINT `calibration_sources_serial_unique` UNIQUE(`serial`)
);
--> statement-breakpoint
CREATE TABLE `checkout_runs` (
	`checkout_id` int NOT NULL,
	`run_number` int NOT NULL,
	CONSTRAINT `checkout_runs_checkout_id_run_number_pk` PRIMARY KEY(`checkout_id`,`run_number`)
);
--> statement-breakpoint
CREATE TABLE `safety_review_events` (
	`id` int AUTO_INCREMENT NOT NULL,
	`review_id` int NOT NULL,
	`from_state` enum('awaiting_review','acknowledged','follow_up','closed'),
	`to_state` enum('awaiting_review','acknowledged','follow_up','closed') NOT NULL,
	`comment` text NOT NULL,
	`actor_id` int,
	`at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `safety_review_events_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `safety_reviews` (
	`id` int AUTO_INCREMENT NOT NULL,
	`entry_id` int NOT NULL,
	`state` enum('awaiting_review','acknowledged','follow_up','closed') NOT NULL DEFAULT 'awaiting_review',
	`reviewed_revision` int,
	`entered_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `safety_reviews_id` PRIMARY KEY(`id`),
	CONSTRAINT `safety_reviews_entry_id_unique` UNIQUE(`entry_id`)
);
--> statement-breakpoint
CREATE TABLE `source_checkouts` (
	`id` int AUTO_INCREMENT NOT NULL,
	`source_id` int NOT NULL,
	`checked_out_by` int NOT NULL,
	`checked_out_at` datetime(3) NOT NULL,
	`purpose` varchar(200) NOT NULL,
	`returned_at` datetime(3),
	`returned_by` int,
	`overdue_notified_at` datetime(3),
	CONSTRAINT `source_checkouts_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `outbox` (
	`id` int AUTO_INCREMENT NOT NULL,
	`kind` varchar(40) NOT NULL,
	`to_address` varchar(320) NOT NULL,
	`subject` varchar(300) NOT NULL,
	`text_body` text NOT NULL,
	`dedupe_key` varchar(200),
	`attempts` int NOT NULL DEFAULT 0,
	`last_error` varchar(500),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`sent_at` datetime(3),
	CONSTRAINT `outbox_id` PRIMARY KEY(`id`),
	CONSTRAINT `outbox_dedupe_key_unique` UNIQUE(`dedupe_key`)
);
--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_invited_by_users_id_fk` FOREIGN KEY (`invited_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `machine_tokens` ADD CONSTRAINT `machine_tokens_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `user_roles` ADD CONSTRAINT `user_roles_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `audit_events` ADD CONSTRAINT `audit_events_actor_user_id_users_id_fk` FOREIGN KEY (`actor_user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `audit_events` ADD CONSTRAINT `audit_events_actor_token_id_machine_tokens_id_fk` FOREIGN KEY (`actor_token_id`) REFERENCES `machine_tokens`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `detector_configs` ADD CONSTRAINT `detector_configs_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `runs` ADD CONSTRAINT `runs_config_id_detector_configs_id_fk` FOREIGN KEY (`config_id`) REFERENCES `detector_configs`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `runs` ADD CONSTRAINT `runs_opened_by_user_id_users_id_fk` FOREIGN KEY (`opened_by_user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `runs` ADD CONSTRAINT `runs_opened_by_token_id_machine_tokens_id_fk` FOREIGN KEY (`opened_by_token_id`) REFERENCES `machine_tokens`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `attachments` ADD CONSTRAINT `attachments_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `attachments` ADD CONSTRAINT `attachments_uploaded_by_users_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `entries` ADD CONSTRAINT `entries_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `entries` ADD CONSTRAINT `entries_retracted_by_users_id_fk` FOREIGN KEY (`retracted_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `entry_revisions` ADD CONSTRAINT `entry_revisions_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `entry_revisions` ADD CONSTRAINT `entry_revisions_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `entry_runs` ADD CONSTRAINT `entry_runs_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `entry_tags` ADD CONSTRAINT `entry_tags_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bad_time_flags` ADD CONSTRAINT `bad_time_flags_subsystem_subsystems_code_fk` FOREIGN KEY (`subsystem`) REFERENCES `subsystems`(`code`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bad_time_flags` ADD CONSTRAINT `bad_time_flags_proposed_by_users_id_fk` FOREIGN KEY (`proposed_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bad_time_flags` ADD CONSTRAINT `bad_time_flags_confirmed_by_users_id_fk` FOREIGN KEY (`confirmed_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `bad_time_flags` ADD CONSTRAINT `bad_time_flags_withdrawn_by_users_id_fk` FOREIGN KEY (`withdrawn_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `dq_periods` ADD CONSTRAINT `dq_periods_unblinded_by_users_id_fk` FOREIGN KEY (`unblinded_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `dq_periods` ADD CONSTRAINT `dq_periods_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `flag_events` ADD CONSTRAINT `flag_events_flag_id_bad_time_flags_id_fk` FOREIGN KEY (`flag_id`) REFERENCES `bad_time_flags`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `flag_events` ADD CONSTRAINT `flag_events_actor_id_users_id_fk` FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `calibration_sources` ADD CONSTRAINT `calibration_sources_custodian_id_users_id_fk` FOREIGN KEY (`custodian_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `checkout_runs` ADD CONSTRAINT `checkout_runs_checkout_id_source_checkouts_id_fk` FOREIGN KEY (`checkout_id`) REFERENCES `source_checkouts`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `safety_review_events` ADD CONSTRAINT `safety_review_events_review_id_safety_reviews_id_fk` FOREIGN KEY (`review_id`) REFERENCES `safety_reviews`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `safety_review_events` ADD CONSTRAINT `safety_review_events_actor_id_users_id_fk` FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `safety_reviews` ADD CONSTRAINT `safety_reviews_entry_id_entries_id_fk` FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `source_checkouts` ADD CONSTRAINT `source_checkouts_source_id_calibration_sources_id_fk` FOREIGN KEY (`source_id`) REFERENCES `calibration_sources`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `source_checkouts` ADD CONSTRAINT `source_checkouts_checked_out_by_users_id_fk` FOREIGN KEY (`checked_out_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `source_checkouts` ADD CONSTRAINT `source_checkouts_returned_by_users_id_fk` FOREIGN KEY (`returned_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `invitations_user_idx` ON `invitations` (`user_id`);--> statement-breakpoint
CREATE INDEX `sign_in_failures_key_at_idx` ON `sign_in_failures` (`throttle_key`,`at`);--> statement-breakpoint
CREATE INDEX `audit_record_idx` ON `audit_events` (`record_type`,`record_id`);--> statement-breakpoint
CREATE INDEX `audit_at_idx` ON `audit_events` (`at`);--> statement-breakpoint
CREATE INDEX `configs_detector_from_idx` ON `detector_configs` (`detector`,`effective_from`);--> statement-breakpoint
CREATE INDEX `runs_start_idx` ON `runs` (`start_at`);--> statement-breakpoint
CREATE INDEX `runs_type_start_idx` ON `runs` (`type`,`start_at`);--> statement-breakpoint
CREATE INDEX `runs_status_idx` ON `runs` (`status`);--> statement-breakpoint
CREATE INDEX `attachments_entry_idx` ON `attachments` (`entry_id`);--> statement-breakpoint
CREATE INDEX `entries_created_idx` ON `entries` (`created_at`);--> statement-breakpoint
CREATE INDEX `entries_category_idx` ON `entries` (`category`,`created_at`);--> statement-breakpoint
CREATE INDEX `entry_revisions_current_idx` ON `entry_revisions` (`is_current`);--> statement-breakpoint
CREATE INDEX `entry_runs_run_idx` ON `entry_runs` (`run_number`);--> statement-breakpoint
CREATE INDEX `entry_tags_tag_idx` ON `entry_tags` (`tag`);--> statement-breakpoint
CREATE INDEX `flags_state_start_idx` ON `bad_time_flags` (`state`,`start_at`);--> statement-breakpoint
CREATE INDEX `flag_events_flag_idx` ON `flag_events` (`flag_id`);--> statement-breakpoint
CREATE INDEX `safety_review_events_review_idx` ON `safety_review_events` (`review_id`);--> statement-breakpoint
CREATE INDEX `safety_reviews_state_idx` ON `safety_reviews` (`state`,`entered_at`);--> statement-breakpoint
CREATE INDEX `source_checkouts_source_idx` ON `source_checkouts` (`source_id`,`checked_out_at`);--> statement-breakpoint
CREATE INDEX `outbox_sent_idx` ON `outbox` (`sent_at`);