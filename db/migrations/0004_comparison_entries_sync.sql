-- Keeps comparison_entries (one narrow row per current released report) in step with the tables it
-- summarises, whichever code path writes them: releasing, correcting (the old version gets
-- superseded_by_id), withdrawing, seeding, or a seller editing the listing.
CREATE PROCEDURE comparison_entry_refresh(IN changed_report_id INT)
BEGIN
  DELETE FROM comparison_entries WHERE report_id = changed_report_id;
  INSERT INTO comparison_entries (report_id, inspection_id, machine_id, maker, model, lathe_kind, swing_mm, between_centres_mm, year_built, town, region, asking_price_minor, price_currency, overall_condition, overall_score, confidence, fair_market_value_minor, repair_estimate_minor, value_currency, released_at, bed_score, bed_grade, spindle_score, spindle_grade, gearbox_score, gearbox_grade, slides_score, slides_grade, tailstock_score, tailstock_grade, drive_score, drive_grade, electrical_score, electrical_grade, accessories_score, accessories_grade)
  SELECT r.id, r.inspection_id, r.machine_id, m.maker, m.model, m.lathe_kind, m.swing_mm, m.between_centres_mm, m.year_built, m.town, m.region, m.asking_price_minor, m.currency, r.overall_condition, r.overall_score, r.confidence, r.fair_market_value_minor, r.repair_estimate_minor, r.currency, r.released_at,
    MAX(CASE WHEN s.subsystem = 'bed-and-ways' THEN s.score END), MAX(CASE WHEN s.subsystem = 'bed-and-ways' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'spindle-and-headstock' THEN s.score END), MAX(CASE WHEN s.subsystem = 'spindle-and-headstock' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'gearbox-and-feeds' THEN s.score END), MAX(CASE WHEN s.subsystem = 'gearbox-and-feeds' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'slides-and-screws' THEN s.score END), MAX(CASE WHEN s.subsystem = 'slides-and-screws' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'tailstock' THEN s.score END), MAX(CASE WHEN s.subsystem = 'tailstock' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'drive' THEN s.score END), MAX(CASE WHEN s.subsystem = 'drive' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'electrical-and-safety' THEN s.score END), MAX(CASE WHEN s.subsystem = 'electrical-and-safety' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'accessories' THEN s.score END), MAX(CASE WHEN s.subsystem = 'accessories' THEN s.grade END)
  FROM reports r
  INNER JOIN machines m ON m.id = r.machine_id
  LEFT JOIN report_subsystem_scores s ON s.report_id = r.id
  WHERE r.id = changed_report_id AND r.status = 'released' AND r.superseded_by_id IS NULL
  GROUP BY r.id;
END;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_report_inserted AFTER INSERT ON reports FOR EACH ROW
BEGIN
  IF NEW.status = 'released' THEN
    CALL comparison_entry_refresh(NEW.id);
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_report_updated AFTER UPDATE ON reports FOR EACH ROW
BEGIN
  IF NEW.status = 'released' OR OLD.status = 'released' THEN
    CALL comparison_entry_refresh(NEW.id);
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_score_inserted AFTER INSERT ON report_subsystem_scores FOR EACH ROW
BEGIN
  UPDATE comparison_entries SET
    bed_score = IF(NEW.subsystem = 'bed-and-ways', NEW.score, bed_score), bed_grade = IF(NEW.subsystem = 'bed-and-ways', NEW.grade, bed_grade),
    spindle_score = IF(NEW.subsystem = 'spindle-and-headstock', NEW.score, spindle_score), spindle_grade = IF(NEW.subsystem = 'spindle-and-headstock', NEW.grade, spindle_grade),
    gearbox_score = IF(NEW.subsystem = 'gearbox-and-feeds', NEW.score, gearbox_score), gearbox_grade = IF(NEW.subsystem = 'gearbox-and-feeds', NEW.grade, gearbox_grade),
    slides_score = IF(NEW.subsystem = 'slides-and-screws', NEW.score, slides_score), slides_grade = IF(NEW.subsystem = 'slides-and-screws', NEW.grade, slides_grade),
    tailstock_score = IF(NEW.subsystem = 'tailstock', NEW.score, tailstock_score), tailstock_grade = IF(NEW.subsystem = 'tailstock', NEW.grade, tailstock_grade),
    drive_score = IF(NEW.subsystem = 'drive', NEW.score, drive_score), drive_grade = IF(NEW.subsystem = 'drive', NEW.grade, drive_grade),
    electrical_score = IF(NEW.subsystem = 'electrical-and-safety', NEW.score, electrical_score), electrical_grade = IF(NEW.subsystem = 'electrical-and-safety', NEW.grade, electrical_grade),
    accessories_score = IF(NEW.subsystem = 'accessories', NEW.score, accessories_score), accessories_grade = IF(NEW.subsystem = 'accessories', NEW.grade, accessories_grade)
  WHERE report_id = NEW.report_id;
END;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_score_updated AFTER UPDATE ON report_subsystem_scores FOR EACH ROW
BEGIN
  UPDATE comparison_entries SET
    bed_score = IF(NEW.subsystem = 'bed-and-ways', NEW.score, bed_score), bed_grade = IF(NEW.subsystem = 'bed-and-ways', NEW.grade, bed_grade),
    spindle_score = IF(NEW.subsystem = 'spindle-and-headstock', NEW.score, spindle_score), spindle_grade = IF(NEW.subsystem = 'spindle-and-headstock', NEW.grade, spindle_grade),
    gearbox_score = IF(NEW.subsystem = 'gearbox-and-feeds', NEW.score, gearbox_score), gearbox_grade = IF(NEW.subsystem = 'gearbox-and-feeds', NEW.grade, gearbox_grade),
    slides_score = IF(NEW.subsystem = 'slides-and-screws', NEW.score, slides_score), slides_grade = IF(NEW.subsystem = 'slides-and-screws', NEW.grade, slides_grade),
    tailstock_score = IF(NEW.subsystem = 'tailstock', NEW.score, tailstock_score), tailstock_grade = IF(NEW.subsystem = 'tailstock', NEW.grade, tailstock_grade),
    drive_score = IF(NEW.subsystem = 'drive', NEW.score, drive_score), drive_grade = IF(NEW.subsystem = 'drive', NEW.grade, drive_grade),
    electrical_score = IF(NEW.subsystem = 'electrical-and-safety', NEW.score, electrical_score), electrical_grade = IF(NEW.subsystem = 'electrical-and-safety', NEW.grade, electrical_grade),
    accessories_score = IF(NEW.subsystem = 'accessories', NEW.score, accessories_score), accessories_grade = IF(NEW.subsystem = 'accessories', NEW.grade, accessories_grade)
  WHERE report_id = NEW.report_id;
END;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_machine_updated AFTER UPDATE ON machines FOR EACH ROW
BEGIN
  UPDATE comparison_entries SET
    maker = NEW.maker, model = NEW.model, lathe_kind = NEW.lathe_kind, swing_mm = NEW.swing_mm,
    between_centres_mm = NEW.between_centres_mm, year_built = NEW.year_built, town = NEW.town, region = NEW.region,
    asking_price_minor = NEW.asking_price_minor, price_currency = NEW.currency
  WHERE machine_id = NEW.id;
END;
--> statement-breakpoint
INSERT INTO comparison_entries (report_id, inspection_id, machine_id, maker, model, lathe_kind, swing_mm, between_centres_mm, year_built, town, region, asking_price_minor, price_currency, overall_condition, overall_score, confidence, fair_market_value_minor, repair_estimate_minor, value_currency, released_at, bed_score, bed_grade, spindle_score, spindle_grade, gearbox_score, gearbox_grade, slides_score, slides_grade, tailstock_score, tailstock_grade, drive_score, drive_grade, electrical_score, electrical_grade, accessories_score, accessories_grade)
SELECT r.id, r.inspection_id, r.machine_id, m.maker, m.model, m.lathe_kind, m.swing_mm, m.between_centres_mm, m.year_built, m.town, m.region, m.asking_price_minor, m.currency, r.overall_condition, r.overall_score, r.confidence, r.fair_market_value_minor, r.repair_estimate_minor, r.currency, r.released_at,
  MAX(CASE WHEN s.subsystem = 'bed-and-ways' THEN s.score END), MAX(CASE WHEN s.subsystem = 'bed-and-ways' THEN s.grade END),
  MAX(CASE WHEN s.subsystem = 'spindle-and-headstock' THEN s.score END), MAX(CASE WHEN s.subsystem = 'spindle-and-headstock' THEN s.grade END),
  MAX(CASE WHEN s.subsystem = 'gearbox-and-feeds' THEN s.score END), MAX(CASE WHEN s.subsystem = 'gearbox-and-feeds' THEN s.grade END),
  MAX(CASE WHEN s.subsystem = 'slides-and-screws' THEN s.score END), MAX(CASE WHEN s.subsystem = 'slides-and-screws' THEN s.grade END),
  MAX(CASE WHEN s.subsystem = 'tailstock' THEN s.score END), MAX(CASE WHEN s.subsystem = 'tailstock' THEN s.grade END),
  MAX(CASE WHEN s.subsystem = 'drive' THEN s.score END), MAX(CASE WHEN s.subsystem = 'drive' THEN s.grade END),
  MAX(CASE WHEN s.subsystem = 'electrical-and-safety' THEN s.score END), MAX(CASE WHEN s.subsystem = 'electrical-and-safety' THEN s.grade END),
  MAX(CASE WHEN s.subsystem = 'accessories' THEN s.score END), MAX(CASE WHEN s.subsystem = 'accessories' THEN s.grade END)
FROM reports r
INNER JOIN machines m ON m.id = r.machine_id
LEFT JOIN report_subsystem_scores s ON s.report_id = r.id
WHERE r.status = 'released' AND r.superseded_by_id IS NULL
GROUP BY r.id;
