-- The word index files each job under a row id that begins with its company: the company's key
-- times 2^32, plus the job's row id. A search then reads only its own company's part of the index
-- (`rowid BETWEEN key * 2^32 AND key * 2^32 + 2^32 - 1`), so counting a company's matches reads
-- no job row: 1,000 matches among 10,000 jobs counted without reading the 1,000 jobs' rows to test
-- their company (bench/jobs.ts). The triggers of 0006 are replaced to compute the new row ids.
-- company_keys gives each company that has jobs a small whole number, kept by the job triggers.
-- Its rows are never deleted or changed, so a key is never reused and never moves.
CREATE TABLE `company_keys` (
  `company_id` text PRIMARY KEY NOT NULL,
  `key` integer NOT NULL UNIQUE
);
--> statement-breakpoint
INSERT INTO `company_keys`(company_id, `key`)
SELECT company_id, row_number() OVER (ORDER BY min(rowid)) FROM `jobs` GROUP BY company_id;
--> statement-breakpoint
DROP TABLE `job_words`;
--> statement-breakpoint
CREATE VIRTUAL TABLE `job_words` USING fts5(body, tokenize = 'unicode61 remove_diacritics 2', prefix = '2 3 4');
--> statement-breakpoint
DROP TRIGGER `job_search_job_insert`;
--> statement-breakpoint
DROP TRIGGER `job_search_job_update`;
--> statement-breakpoint
DROP TRIGGER `job_search_job_delete`;
--> statement-breakpoint
DROP TRIGGER `job_search_client_update`;
--> statement-breakpoint
DROP TRIGGER `job_search_house_update`;
--> statement-breakpoint
CREATE TRIGGER `job_search_job_insert` AFTER INSERT ON `jobs` BEGIN
  INSERT OR IGNORE INTO `company_keys`(company_id, `key`)
  VALUES (NEW.company_id, (SELECT coalesce(max(`key`), 0) + 1 FROM `company_keys`));
  INSERT INTO `job_search`(rowid, body)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
  INSERT INTO `job_words`(rowid, body)
  SELECT k.`key` * 4294967296 + NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h, `company_keys` k WHERE c.id = NEW.client_id AND h.id = NEW.house_id AND k.company_id = NEW.company_id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_job_update` AFTER UPDATE OF `number`, `title`, `client_id`, `house_id`, `company_id` ON `jobs` BEGIN
  INSERT OR IGNORE INTO `company_keys`(company_id, `key`)
  VALUES (NEW.company_id, (SELECT coalesce(max(`key`), 0) + 1 FROM `company_keys`));
  DELETE FROM `job_search` WHERE rowid = OLD.rowid;
  DELETE FROM `job_words` WHERE rowid = (SELECT `key` * 4294967296 + OLD.rowid FROM `company_keys` WHERE company_id = OLD.company_id);
  INSERT INTO `job_search`(rowid, body)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
  INSERT INTO `job_words`(rowid, body)
  SELECT k.`key` * 4294967296 + NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h, `company_keys` k WHERE c.id = NEW.client_id AND h.id = NEW.house_id AND k.company_id = NEW.company_id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_job_delete` AFTER DELETE ON `jobs` BEGIN
  DELETE FROM `job_search` WHERE rowid = OLD.rowid;
  DELETE FROM `job_words` WHERE rowid = (SELECT `key` * 4294967296 + OLD.rowid FROM `company_keys` WHERE company_id = OLD.company_id);
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_client_update` AFTER UPDATE OF `name` ON `clients` BEGIN
  DELETE FROM `job_search` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE client_id = NEW.id);
  DELETE FROM `job_words` WHERE rowid IN (SELECT k.`key` * 4294967296 + j.rowid FROM `jobs` j JOIN `company_keys` k ON k.company_id = j.company_id WHERE j.client_id = NEW.id);
  INSERT INTO `job_search`(rowid, body)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || NEW.name || ' ' || h.street || ' ' || h.city
  FROM `jobs` j JOIN `houses` h ON h.id = j.house_id WHERE j.client_id = NEW.id;
  INSERT INTO `job_words`(rowid, body)
  SELECT k.`key` * 4294967296 + j.rowid, j.number || ' ' || j.title || ' ' || NEW.name || ' ' || h.street || ' ' || h.city
  FROM `jobs` j JOIN `houses` h ON h.id = j.house_id JOIN `company_keys` k ON k.company_id = j.company_id WHERE j.client_id = NEW.id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_house_update` AFTER UPDATE OF `street`, `city` ON `houses` BEGIN
  DELETE FROM `job_search` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE house_id = NEW.id);
  DELETE FROM `job_words` WHERE rowid IN (SELECT k.`key` * 4294967296 + j.rowid FROM `jobs` j JOIN `company_keys` k ON k.company_id = j.company_id WHERE j.house_id = NEW.id);
  INSERT INTO `job_search`(rowid, body)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || c.name || ' ' || NEW.street || ' ' || NEW.city
  FROM `jobs` j JOIN `clients` c ON c.id = j.client_id WHERE j.house_id = NEW.id;
  INSERT INTO `job_words`(rowid, body)
  SELECT k.`key` * 4294967296 + j.rowid, j.number || ' ' || j.title || ' ' || c.name || ' ' || NEW.street || ' ' || NEW.city
  FROM `jobs` j JOIN `clients` c ON c.id = j.client_id JOIN `company_keys` k ON k.company_id = j.company_id WHERE j.house_id = NEW.id;
END;
--> statement-breakpoint
INSERT INTO `job_words`(rowid, body)
SELECT k.`key` * 4294967296 + j.rowid, j.number || ' ' || j.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
FROM `jobs` j JOIN `clients` c ON c.id = j.client_id JOIN `houses` h ON h.id = j.house_id JOIN `company_keys` k ON k.company_id = j.company_id;
