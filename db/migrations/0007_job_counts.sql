-- How many jobs each company has in each stage, kept by triggers, so the jobs list of an owner or
-- auditor (who see the whole company) reads its total from at most seven rows instead of counting
-- every job on every page. tests/db/job-counts.test.ts checks it against count(*) after inserts,
-- stage changes and deletes.
CREATE TABLE `job_counts` (
  `company_id` text NOT NULL,
  `stage` text NOT NULL,
  `n` integer NOT NULL,
  PRIMARY KEY (`company_id`, `stage`)
) WITHOUT ROWID;
--> statement-breakpoint
CREATE TRIGGER `job_counts_job_insert` AFTER INSERT ON `jobs` BEGIN
  INSERT INTO `job_counts`(company_id, stage, n) VALUES (NEW.company_id, NEW.stage, 1)
  ON CONFLICT(company_id, stage) DO UPDATE SET n = n + 1;
END;
--> statement-breakpoint
CREATE TRIGGER `job_counts_job_delete` AFTER DELETE ON `jobs` BEGIN
  UPDATE `job_counts` SET n = n - 1 WHERE company_id = OLD.company_id AND stage = OLD.stage;
END;
--> statement-breakpoint
CREATE TRIGGER `job_counts_job_update` AFTER UPDATE OF `company_id`, `stage` ON `jobs`
WHEN OLD.company_id IS NOT NEW.company_id OR OLD.stage IS NOT NEW.stage BEGIN
  UPDATE `job_counts` SET n = n - 1 WHERE company_id = OLD.company_id AND stage = OLD.stage;
  INSERT INTO `job_counts`(company_id, stage, n) VALUES (NEW.company_id, NEW.stage, 1)
  ON CONFLICT(company_id, stage) DO UPDATE SET n = n + 1;
END;
--> statement-breakpoint
INSERT INTO `job_counts`(company_id, stage, n)
SELECT company_id, stage, count(*) FROM `jobs` GROUP BY company_id, stage;
