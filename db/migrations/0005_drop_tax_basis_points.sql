ALTER TABLE `companies` DROP COLUMN `tax_rate_basis_points`;--> statement-breakpoint
ALTER TABLE `proposals` DROP COLUMN `tax_rate_basis_points`;