CREATE TABLE `acceptances` (
	`id` text PRIMARY KEY NOT NULL,
	`issued_document_id` text NOT NULL,
	`name` text NOT NULL,
	`ip` text,
	`user_agent` text,
	`document_hash` text NOT NULL,
	`accepted_at` integer NOT NULL,
	`user_id` text,
	FOREIGN KEY (`issued_document_id`) REFERENCES `issued_documents`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `acceptances_issued_document_id_unique` ON `acceptances` (`issued_document_id`);--> statement-breakpoint
CREATE TABLE `activity_log` (
	`id` text PRIMARY KEY NOT NULL,
	`company_id` text,
	`user_id` text,
	`action` text NOT NULL,
	`entity_type` text,
	`entity_id` text,
	`detail` text,
	`ip` text,
	`at` integer NOT NULL,
	FOREIGN KEY (`company_id`) REFERENCES `companies`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `activity_log_company_at_idx` ON `activity_log` (`company_id`,`at`);--> statement-breakpoint
CREATE INDEX `activity_log_entity_idx` ON `activity_log` (`entity_type`,`entity_id`);--> statement-breakpoint
CREATE INDEX `activity_log_user_idx` ON `activity_log` (`user_id`);--> statement-breakpoint
CREATE TABLE `assemblies` (
	`id` text PRIMARY KEY NOT NULL,
	`company_id` text,
	`job_id` text,
	`built_in_key` text,
	`name` text NOT NULL,
	`kind` text NOT NULL,
	`framing_material` text DEFAULT 'none' NOT NULL,
	`framing_member` text,
	`cavity_depth_in` real,
	`spacing_in` real,
	`framing_fraction` real,
	`method` text,
	`u_factor_override` real,
	`notes` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`company_id`) REFERENCES `companies`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `assemblies_company_kind_idx` ON `assemblies` (`company_id`,`kind`);--> statement-breakpoint
CREATE INDEX `assemblies_job_idx` ON `assemblies` (`job_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `assemblies_built_in_key_unique` ON `assemblies` (`built_in_key`) WHERE "assemblies"."company_id" is null;--> statement-breakpoint
CREATE TABLE `assembly_layers` (
	`id` text PRIMARY KEY NOT NULL,
	`assembly_id` text NOT NULL,
	`position` integer NOT NULL,
	`material_key` text NOT NULL,
	`thickness_in` real,
	`path` text DEFAULT 'continuous' NOT NULL,
	`label` text,
	FOREIGN KEY (`assembly_id`) REFERENCES `assemblies`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `assembly_layers_assembly_position_idx` ON `assembly_layers` (`assembly_id`,`position`);--> statement-breakpoint
CREATE TABLE `auth_tokens` (
	`id` text PRIMARY KEY NOT NULL,
	`user_id` text NOT NULL,
	`purpose` text NOT NULL,
	`token_hash` text NOT NULL,
	`expires_at` integer NOT NULL,
	`used_at` integer,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `auth_tokens_token_hash_unique` ON `auth_tokens` (`token_hash`);--> statement-breakpoint
CREATE INDEX `auth_tokens_user_idx` ON `auth_tokens` (`user_id`);--> statement-breakpoint
CREATE TABLE `clients` (
	`id` text PRIMARY KEY NOT NULL,
	`company_id` text NOT NULL,
	`user_id` text,
	`name` text NOT NULL,
	`email` text,
	`phone` text,
	`mailing_address` text,
	`notes` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`company_id`) REFERENCES `companies`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `clients_company_name_idx` ON `clients` (`company_id`,`name`);--> statement-breakpoint
CREATE INDEX `clients_user_idx` ON `clients` (`user_id`);--> statement-breakpoint
CREATE TABLE `companies` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`slug` text NOT NULL,
	`phone` text,
	`email` text,
	`address` text,
	`license_line` text,
	`insurance_line` text,
	`tax_rate_basis_points` integer DEFAULT 0 NOT NULL,
	`grid_co2_lb_per_kwh` real,
	`fuel_prices_cents_per_unit` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL
);
--> statement-breakpoint
CREATE UNIQUE INDEX `companies_slug_unique` ON `companies` (`slug`);--> statement-breakpoint
CREATE TABLE `crew_log_entries` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`surface_id` text,
	`user_id` text NOT NULL,
	`client_request_id` text NOT NULL,
	`holes_drilled` integer DEFAULT 0 NOT NULL,
	`bags_blown` real DEFAULT 0 NOT NULL,
	`blocked_bays` integer DEFAULT 0 NOT NULL,
	`prefilled_bays` integer DEFAULT 0 NOT NULL,
	`note` text,
	`logged_at` integer NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`surface_id`) REFERENCES `surfaces`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `crew_log_entries_client_request_id_unique` ON `crew_log_entries` (`client_request_id`);--> statement-breakpoint
CREATE INDEX `crew_log_entries_job_logged_idx` ON `crew_log_entries` (`job_id`,`logged_at`);--> statement-breakpoint
CREATE INDEX `crew_log_entries_surface_idx` ON `crew_log_entries` (`surface_id`);--> statement-breakpoint
CREATE TABLE `heating_systems` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`fuel` text NOT NULL,
	`efficiency` real NOT NULL,
	`hspf` real,
	`fuel_price_cents_per_unit` integer NOT NULL,
	`output_btuh` real,
	`label` text NOT NULL,
	`is_primary` integer DEFAULT true NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `heating_systems_job_idx` ON `heating_systems` (`job_id`);--> statement-breakpoint
CREATE TABLE `houses` (
	`id` text PRIMARY KEY NOT NULL,
	`company_id` text NOT NULL,
	`client_id` text NOT NULL,
	`street` text NOT NULL,
	`city` text NOT NULL,
	`state` text NOT NULL,
	`postal_code` text NOT NULL,
	`year_built` integer NOT NULL,
	`stories` real NOT NULL,
	`conditioned_area_ft2` real NOT NULL,
	`volume_ft3` real NOT NULL,
	`ceiling_height_ft` real,
	`bedrooms` integer NOT NULL,
	`foundation` text NOT NULL,
	`shielding` text DEFAULT 'normal' NOT NULL,
	`climate_station_wmo` text,
	`custom_climate` text,
	`epw_climate` text,
	`indoor_design_temp_f` real DEFAULT 70 NOT NULL,
	`indoor_rh_pct` real DEFAULT 40 NOT NULL,
	`hazards` text NOT NULL,
	`notes` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`company_id`) REFERENCES `companies`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`client_id`) REFERENCES `clients`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `houses_company_idx` ON `houses` (`company_id`);--> statement-breakpoint
CREATE INDEX `houses_client_idx` ON `houses` (`client_id`);--> statement-breakpoint
CREATE TABLE `issued_documents` (
	`id` text PRIMARY KEY NOT NULL,
	`company_id` text NOT NULL,
	`job_id` text NOT NULL,
	`kind` text NOT NULL,
	`version` integer NOT NULL,
	`snapshot` text NOT NULL,
	`content_hash` text NOT NULL,
	`issued_at` integer NOT NULL,
	`issued_by_id` text NOT NULL,
	`superseded_at` integer,
	`proposal_id` text,
	FOREIGN KEY (`company_id`) REFERENCES `companies`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`issued_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`proposal_id`) REFERENCES `proposals`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `issued_documents_job_kind_version_unique` ON `issued_documents` (`job_id`,`kind`,`version`);--> statement-breakpoint
CREATE INDEX `issued_documents_company_issued_idx` ON `issued_documents` (`company_id`,`issued_at`);--> statement-breakpoint
CREATE INDEX `issued_documents_proposal_idx` ON `issued_documents` (`proposal_id`);--> statement-breakpoint
CREATE TABLE `job_crew` (
	`job_id` text NOT NULL,
	`user_id` text NOT NULL,
	`assigned_at` integer NOT NULL,
	PRIMARY KEY(`job_id`, `user_id`),
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `job_crew_user_idx` ON `job_crew` (`user_id`);--> statement-breakpoint
CREATE TABLE `job_stage_events` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`from_stage` text,
	`to_stage` text NOT NULL,
	`by_user_id` text NOT NULL,
	`at` integer NOT NULL,
	`note` text,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`by_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `job_stage_events_job_at_idx` ON `job_stage_events` (`job_id`,`at`);--> statement-breakpoint
CREATE TABLE `jobs` (
	`id` text PRIMARY KEY NOT NULL,
	`company_id` text NOT NULL,
	`number` integer NOT NULL,
	`house_id` text NOT NULL,
	`client_id` text NOT NULL,
	`title` text NOT NULL,
	`stage` text DEFAULT 'intake' NOT NULL,
	`auditor_id` text,
	`intake_notes` text,
	`target_cfm50` real,
	`version` integer DEFAULT 1 NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	`created_by_id` text NOT NULL,
	FOREIGN KEY (`company_id`) REFERENCES `companies`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`house_id`) REFERENCES `houses`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`client_id`) REFERENCES `clients`(`id`) ON UPDATE no action ON DELETE no action,
	FOREIGN KEY (`auditor_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`created_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `jobs_company_number_unique` ON `jobs` (`company_id`,`number`);--> statement-breakpoint
CREATE INDEX `jobs_company_stage_idx` ON `jobs` (`company_id`,`stage`);--> statement-breakpoint
CREATE INDEX `jobs_company_updated_idx` ON `jobs` (`company_id`,`updated_at`);--> statement-breakpoint
CREATE INDEX `jobs_house_idx` ON `jobs` (`house_id`);--> statement-breakpoint
CREATE INDEX `jobs_client_idx` ON `jobs` (`client_id`);--> statement-breakpoint
CREATE INDEX `jobs_auditor_idx` ON `jobs` (`auditor_id`);--> statement-breakpoint
CREATE TABLE `leakage_tests` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`phase` text NOT NULL,
	`cfm50` real NOT NULL,
	`tested_at` integer NOT NULL,
	`outdoor_temp_f` real,
	`indoor_temp_f` real,
	`wind_mph` real,
	`notes` text,
	`recorded_by_id` text NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`recorded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `leakage_tests_job_tested_idx` ON `leakage_tests` (`job_id`,`tested_at`);--> statement-breakpoint
CREATE TABLE `mail_outbox` (
	`id` text PRIMARY KEY NOT NULL,
	`company_id` text,
	`to` text NOT NULL,
	`subject` text NOT NULL,
	`text` text NOT NULL,
	`html` text,
	`kind` text NOT NULL,
	`status` text DEFAULT 'queued' NOT NULL,
	`attempts` integer DEFAULT 0 NOT NULL,
	`last_error` text,
	`next_attempt_at` integer,
	`created_at` integer NOT NULL,
	`sent_at` integer,
	`related_job_id` text,
	FOREIGN KEY (`company_id`) REFERENCES `companies`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`related_job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `mail_outbox_status_created_idx` ON `mail_outbox` (`status`,`created_at`);--> statement-breakpoint
CREATE INDEX `mail_outbox_company_created_idx` ON `mail_outbox` (`company_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `mail_outbox_related_job_idx` ON `mail_outbox` (`related_job_id`);--> statement-breakpoint
CREATE TABLE `materials` (
	`id` text PRIMARY KEY NOT NULL,
	`company_id` text NOT NULL,
	`key` text NOT NULL,
	`name` text NOT NULL,
	`category` text NOT NULL,
	`r_per_inch_ip` real,
	`r_value_ip` real,
	`density_lb_per_ft3` real,
	`source` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`company_id`) REFERENCES `companies`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `materials_company_key_unique` ON `materials` (`company_id`,`key`);--> statement-breakpoint
CREATE TABLE `photos` (
	`id` text PRIMARY KEY NOT NULL,
	`company_id` text NOT NULL,
	`job_id` text NOT NULL,
	`surface_id` text,
	`crew_log_entry_id` text,
	`tag` text NOT NULL,
	`caption` text,
	`storage_key` text NOT NULL,
	`thumbnail_key` text,
	`content_type` text NOT NULL,
	`bytes` integer NOT NULL,
	`width` integer,
	`height` integer,
	`taken_at` integer,
	`uploaded_by_id` text NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`company_id`) REFERENCES `companies`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`surface_id`) REFERENCES `surfaces`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`crew_log_entry_id`) REFERENCES `crew_log_entries`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`uploaded_by_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `photos_storage_key_unique` ON `photos` (`storage_key`);--> statement-breakpoint
CREATE INDEX `photos_job_created_idx` ON `photos` (`job_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `photos_company_created_idx` ON `photos` (`company_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `photos_surface_idx` ON `photos` (`surface_id`);--> statement-breakpoint
CREATE INDEX `photos_crew_log_entry_idx` ON `photos` (`crew_log_entry_id`);--> statement-breakpoint
CREATE TABLE `price_book_items` (
	`id` text PRIMARY KEY NOT NULL,
	`company_id` text NOT NULL,
	`code` text NOT NULL,
	`name` text NOT NULL,
	`description` text,
	`kind` text NOT NULL,
	`unit` text NOT NULL,
	`unit_price_cents` integer NOT NULL,
	`taxable` integer DEFAULT true NOT NULL,
	`active` integer DEFAULT true NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`company_id`) REFERENCES `companies`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `price_book_items_company_code_unique` ON `price_book_items` (`company_id`,`code`);--> statement-breakpoint
CREATE INDEX `price_book_items_company_active_idx` ON `price_book_items` (`company_id`,`active`,`name`);--> statement-breakpoint
CREATE TABLE `proposal_line_items` (
	`id` text PRIMARY KEY NOT NULL,
	`proposal_id` text NOT NULL,
	`position` integer NOT NULL,
	`price_book_item_id` text,
	`upgrade_id` text,
	`description` text NOT NULL,
	`quantity` real NOT NULL,
	`unit` text NOT NULL,
	`unit_price_cents` integer NOT NULL,
	`total_cents` integer NOT NULL,
	`taxable` integer DEFAULT true NOT NULL,
	FOREIGN KEY (`proposal_id`) REFERENCES `proposals`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`price_book_item_id`) REFERENCES `price_book_items`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`upgrade_id`) REFERENCES `upgrades`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `proposal_line_items_proposal_position_idx` ON `proposal_line_items` (`proposal_id`,`position`);--> statement-breakpoint
CREATE TABLE `proposals` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`status` text DEFAULT 'draft' NOT NULL,
	`tax_rate_basis_points` integer NOT NULL,
	`deposit_cents` integer DEFAULT 0 NOT NULL,
	`valid_until` integer,
	`terms` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `proposals_job_idx` ON `proposals` (`job_id`);--> statement-breakpoint
CREATE TABLE `safety_acknowledgements` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`user_id` text NOT NULL,
	`caution_keys` text NOT NULL,
	`acknowledged_at` integer NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `safety_acknowledgements_job_user_idx` ON `safety_acknowledgements` (`job_id`,`user_id`);--> statement-breakpoint
CREATE TABLE `sign_in_attempts` (
	`key` text PRIMARY KEY NOT NULL,
	`failures` integer DEFAULT 0 NOT NULL,
	`first_failure_at` integer NOT NULL,
	`locked_until` integer
);
--> statement-breakpoint
CREATE TABLE `surfaces` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`label` text NOT NULL,
	`kind` text NOT NULL,
	`orientation` text NOT NULL,
	`gross_area_ft2` real NOT NULL,
	`existing_assembly_id` text,
	`proposed_assembly_id` text,
	`parent_surface_id` text,
	`position` integer DEFAULT 0 NOT NULL,
	`cavity_depth_in` real,
	`blocked_bays` integer DEFAULT 0 NOT NULL,
	`notes` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`existing_assembly_id`) REFERENCES `assemblies`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`proposed_assembly_id`) REFERENCES `assemblies`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`parent_surface_id`) REFERENCES `surfaces`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `surfaces_job_position_idx` ON `surfaces` (`job_id`,`position`);--> statement-breakpoint
CREATE INDEX `surfaces_parent_idx` ON `surfaces` (`parent_surface_id`);--> statement-breakpoint
CREATE INDEX `surfaces_existing_assembly_idx` ON `surfaces` (`existing_assembly_id`);--> statement-breakpoint
CREATE INDEX `surfaces_proposed_assembly_idx` ON `surfaces` (`proposed_assembly_id`);--> statement-breakpoint
CREATE TABLE `upgrades` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`type` text NOT NULL,
	`position` integer DEFAULT 0 NOT NULL,
	`params` text NOT NULL,
	`selected` integer DEFAULT true NOT NULL,
	`cost_cents` integer DEFAULT 0 NOT NULL,
	`life_years` integer NOT NULL,
	`price_book_item_id` text,
	`notes` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`price_book_item_id`) REFERENCES `price_book_items`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `upgrades_job_position_idx` ON `upgrades` (`job_id`,`position`);--> statement-breakpoint
CREATE TABLE `users` (
	`id` text PRIMARY KEY NOT NULL,
	`company_id` text NOT NULL,
	`email` text NOT NULL,
	`name` text NOT NULL,
	`password_hash` text,
	`role` text NOT NULL,
	`disabled` integer DEFAULT false NOT NULL,
	`unit_system` text DEFAULT 'ip' NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	`last_sign_in_at` integer,
	FOREIGN KEY (`company_id`) REFERENCES `companies`(`id`) ON UPDATE no action ON DELETE cascade,
	CONSTRAINT "users_email_lower_case" CHECK("users"."email" = lower("users"."email"))
);
--> statement-breakpoint
CREATE UNIQUE INDEX `users_email_unique` ON `users` (`email`);--> statement-breakpoint
CREATE INDEX `users_company_role_idx` ON `users` (`company_id`,`role`);