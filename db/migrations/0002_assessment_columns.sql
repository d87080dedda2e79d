ALTER TABLE `assemblies` ADD `key` text;--> statement-breakpoint
ALTER TABLE `assemblies` ADD `definition` text;--> statement-breakpoint
ALTER TABLE `surfaces` ADD `assembly_key` text;--> statement-breakpoint
ALTER TABLE `surfaces` ADD `height_ft` real;--> statement-breakpoint
ALTER TABLE `surfaces` ADD `buffer_factor` real;--> statement-breakpoint
ALTER TABLE `surfaces` ADD `blocked_bay_fraction` real;--> statement-breakpoint
ALTER TABLE `surfaces` ADD `opening_count` integer;--> statement-breakpoint
ALTER TABLE `surfaces` ADD `product_key` text;--> statement-breakpoint
ALTER TABLE `surfaces` ADD `u_factor_ip` real;--> statement-breakpoint
ALTER TABLE `upgrades` ADD `name` text;