ALTER TABLE `crew_log_entries` ADD `finished` integer DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE `crew_log_entries` ADD `resolution` text;