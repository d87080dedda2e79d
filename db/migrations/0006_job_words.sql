-- A second full-text index for the jobs list search, of whole words: the search matches the
-- beginnings of words ("birch" finds Birchwood Road, "100" finds job 1006) through this index,
-- which reads only the matching words' entries. The trigram index of 0001 stays for a search
-- that finds nothing by word beginnings (any substring, such as "wood" in Birchwood).
-- The triggers of 0001 are replaced by ones that keep both indexes in step.
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
  INSERT INTO `job_search`(rowid, body)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
  INSERT INTO `job_words`(rowid, body)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_job_update` AFTER UPDATE OF `number`, `title`, `client_id`, `house_id` ON `jobs` BEGIN
  DELETE FROM `job_search` WHERE rowid = OLD.rowid;
  DELETE FROM `job_words` WHERE rowid = OLD.rowid;
  INSERT INTO `job_search`(rowid, body)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
  INSERT INTO `job_words`(rowid, body)
  SELECT NEW.rowid, NEW.number || ' ' || NEW.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
  FROM `clients` c, `houses` h WHERE c.id = NEW.client_id AND h.id = NEW.house_id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_job_delete` AFTER DELETE ON `jobs` BEGIN
  DELETE FROM `job_search` WHERE rowid = OLD.rowid;
  DELETE FROM `job_words` WHERE rowid = OLD.rowid;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_client_update` AFTER UPDATE OF `name` ON `clients` BEGIN
  DELETE FROM `job_search` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE client_id = NEW.id);
  DELETE FROM `job_words` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE client_id = NEW.id);
  INSERT INTO `job_search`(rowid, body)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || NEW.name || ' ' || h.street || ' ' || h.city
  FROM `jobs` j JOIN `houses` h ON h.id = j.house_id WHERE j.client_id = NEW.id;
  INSERT INTO `job_words`(rowid, body)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || NEW.name || ' ' || h.street || ' ' || h.city
  FROM `jobs` j JOIN `houses` h ON h.id = j.house_id WHERE j.client_id = NEW.id;
END;
--> statement-breakpoint
CREATE TRIGGER `job_search_house_update` AFTER UPDATE OF `street`, `city` ON `houses` BEGIN
  DELETE FROM `job_search` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE house_id = NEW.id);
  DELETE FROM `job_words` WHERE rowid IN (SELECT rowid FROM `jobs` WHERE house_id = NEW.id);
  INSERT INTO `job_search`(rowid, body)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || c.name || ' ' || NEW.street || ' ' || NEW.city
  FROM `jobs` j JOIN `clients` c ON c.id = j.client_id WHERE j.house_id = NEW.id;
  INSERT INTO `job_words`(rowid, body)
  SELECT j.rowid, j.number || ' ' || j.title || ' ' || c.name || ' ' || NEW.street || ' ' || NEW.city
  FROM `jobs` j JOIN `clients` c ON c.id = j.client_id WHERE j.house_id = NEW.id;
END;
--> statement-breakpoint
INSERT INTO `job_words`(rowid, body)
SELECT j.rowid, j.number || ' ' || j.title || ' ' || c.name || ' ' || h.street || ' ' || h.city
FROM `jobs` j JOIN `clients` c ON c.id = j.client_id JOIN `houses` h ON h.id = j.house_id;
