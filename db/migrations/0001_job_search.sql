-- Full-text index for the jobs list search (client name, street, town, title, job number).
-- FTS5 with the trigram tokenizer matches any substring of three or more characters, case-insensitively.
-- Its rowid is the job's rowid; triggers keep it in step with jobs, clients and houses.
CREATE VIRTUAL TABLE `job_search` USING fts5(body, tokenize = 'trigram');
--> statement-breakpoint
CREATE TRIGGER `job_search_job_insert` AFTER INSERT ON `jobs` BEGIN
  INSERT INTO `job_search`(rowid, body)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_job_update` AFTER UPDATE OF `number`, `title`, `client_id`, `house_id` ON `jobs` BEGIN
  DELETE FROM `job_search` WHERE rowid = OLD.rowid;
  INSERT INTO `job_search`(rowid, body)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_job_delete` AFTER DELETE ON `jobs` BEGIN
  DELETE FROM `job_search` WHERE rowid = OLD.rowid;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_client_update` AFTER UPDATE OF `name` ON `clients` BEGIN
  DELETE FROM `job_search` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE client_id = NEW.id);
  INSERT INTO `job_search`(rowid, body)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || NEW.name || ' ' || h.street || ' ' || h.city
  FROM `jobs` j JOIN `houses` h ON h.id = j.house_id WHERE j.client_id = NEW.id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_house_update` AFTER UPDATE OF `street`, `city` ON `houses` BEGIN
  DELETE FROM `job_search` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE house_id = NEW.id);
  INSERT INTO `job_search`(rowid, body)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || c.name || ' ' || NEW.street || ' ' || NEW.city
  FROM `jobs` j JOIN `clients` c ON c.id = j.client_id WHERE j.house_id = NEW.id;
END;
--> statement-breakpoint
INSERT INTO `job_search`(rowid, body)
SELECT j.rowid, j.number || ' ' || j.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
FROM `jobs` j JOIN `clients` c ON c.id = j.client_id JOIN `houses` h ON h.id = j.house_id;
