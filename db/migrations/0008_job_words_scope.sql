-- The word index of 0006 gains a second column, `scope`: one token naming the job's company
-- ('c' and the company id without dashes). An owner's or auditor's search then counts its matches
-- inside the index alone (`scope : "c…" AND {body} : (…)`), instead of reading every matching job
-- to test its company: 1,000 matches among 10,000 jobs counted in about a fifth of the time
-- (bench/jobs.ts). Searches name the body column, so a typed word never matches a scope token.
-- The triggers that write job_words are replaced to fill the new column; the delete trigger of
-- 0006 stays as it is. A job moving to another company is re-indexed too.
DROP TABLE `job_words`;
--> statement-breakpoint
CREATE VIRTUAL TABLE `job_words` USING fts5(body, scope, tokenize = 'unicode61 remove_diacritics 2', prefix = '2 3 4');
--> statement-breakpoint
DROP TRIGGER `job_search_job_insert`;
--> statement-breakpoint
DROP TRIGGER `job_search_job_update`;
--> statement-breakpoint
DROP TRIGGER `job_search_client_update`;
--> statement-breakpoint
DROP TRIGGER `job_search_house_update`;
--> statement-breakpoint
CREATE TRIGGER `job_search_job_insert` AFTER INSERT ON `jobs` BEGIN
  INSERT INTO `job_search`(rowid, body)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
  INSERT INTO `job_words`(rowid, body, scope)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city, 'c' || replace(NEW.company_id, '-', '')
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_job_update` AFTER UPDATE OF `number`, `title`, `client_id`, `house_id`, `company_id` ON `jobs` BEGIN
  DELETE FROM `job_search` WHERE rowid = OLD.rowid;
  DELETE FROM `job_words` WHERE rowid = OLD.rowid;
  INSERT INTO `job_search`(rowid, body)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
  INSERT INTO `job_words`(rowid, body, scope)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city, 'c' || replace(NEW.company_id, '-', '')
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_client_update` AFTER UPDATE OF `name` ON `clients` BEGIN
  DELETE FROM `job_search` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE client_id = NEW.id);
  DELETE FROM `job_words` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE client_id = NEW.id);
  INSERT INTO `job_search`(rowid, body)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || NEW.name || ' ' || h.street || ' ' || h.city
  FROM `jobs` j JOIN `houses` h ON h.id = j.house_id WHERE j.client_id = NEW.id;
  INSERT INTO `job_words`(rowid, body, scope)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || NEW.name || ' ' || h.street || ' ' || h.city, 'c' || replace(j.company_id, '-', '')
  FROM `jobs` j JOIN `houses` h ON h.id = j.house_id WHERE j.client_id = NEW.id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_house_update` AFTER UPDATE OF `street`, `city` ON `houses` BEGIN
  DELETE FROM `job_search` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE house_id = NEW.id);
  DELETE FROM `job_words` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE house_id = NEW.id);
  INSERT INTO `job_search`(rowid, body)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || c.name || ' ' || NEW.street || ' ' || NEW.city
  FROM `jobs` j JOIN `clients` c ON c.id = j.client_id WHERE j.house_id = NEW.id;
  INSERT INTO `job_words`(rowid, body, scope)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || c.name || ' ' || NEW.street || ' ' || NEW.city, 'c' || replace(j.company_id, '-', '')
  FROM `jobs` j JOIN `clients` c ON c.id = j.client_id WHERE j.house_id = NEW.id;
END;
--> statement-breakpoint
INSERT INTO `job_words`(rowid, body, scope)
SELECT j.rowid, j.number || ' ' || j.title || ' ' || c.name || ' ' || h.street || ' ' || h.city, 'c' || replace(j.company_id, '-', '')
FROM `jobs` j JOIN `clients` c ON c.id = j.client_id JOIN `houses` h ON h.id = j.house_id;
