DROP INDEX `jobs_company_stage_idx`;--> statement-breakpoint
DROP INDEX `jobs_company_updated_idx`;--> statement-breakpoint
CREATE INDEX `jobs_company_stage_idx` ON `jobs` (`company_id`,`stage`,`updated_at`,`number`);--> statement-breakpoint
CREATE INDEX `jobs_company_updated_idx` ON `jobs` (`company_id`,`updated_at`,`number`);