ALTER TABLE `companies` ADD `tax_rate_ppm` integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `proposals` ADD `tax_rate_ppm` integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `upgrades` ADD `pricing` text;--> statement-breakpoint
-- Basis points (hundredths of a percent) to parts per million: one basis point is 100 ppm.
UPDATE `companies` SET `tax_rate_ppm` = `tax_rate_basis_points` * 100;--> statement-breakpoint
UPDATE `proposals` SET `tax_rate_ppm` = `tax_rate_basis_points` * 100;
