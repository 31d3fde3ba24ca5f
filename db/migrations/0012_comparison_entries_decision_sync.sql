-- The comparison table's decision columns (deal-breakers, inclusions value, missing tooling, rigging,
-- landed cost before the reader's converter, nameplate supply, motor, listed and inspected dates),
-- kept by the same triggers as the rest of comparison_entries, now also when a seller edits the
-- moving sheet or the inclusions. Each figure repeats a rule of lib/decision in SQL;
-- tests/integration/comparison-decision-columns.test.ts holds the two to the same answers.

-- Rigging and transport as lib/decision/rigging-estimate.ts estimates it with DEMO_RIGGING_RATES at
-- the comparison table's stated distance of 100 km (lib/comparison/landed-cost-basis.ts):
-- (call-out 350.00 + 120.00 per tonne) × access factor, plus 2.50 per km, 4.50 above 3500 kg.
CREATE FUNCTION comparison_rigging_minor(weight_kg INT, site_access VARCHAR(40)) RETURNS INT DETERMINISTIC
BEGIN
  IF weight_kg IS NULL OR weight_kg <= 0 THEN
    RETURN NULL;
  END IF;
  RETURN ROUND((35000 + 12000 * weight_kg / 1000) * CASE site_access WHEN 'narrow-door-or-steps' THEN 1.25 WHEN 'upper-floor-or-basement' THEN 1.6 ELSE 1 END)
    + IF(weight_kg > 3500, 450, 250) * 100;
END;
--> statement-breakpoint
-- The figures that come from the listing (price, moving sheet, inclusions, motor) for every current
-- report of one machine. Inclusions count in the listing's currency only, each at its condition's
-- share of replacement cost (lib/decision/inclusions-value.ts); none listed leaves both NULL.
CREATE PROCEDURE comparison_entry_listing_refresh(IN changed_machine_id INT)
BEGIN
  UPDATE comparison_entries e
  INNER JOIN machines m ON m.id = e.machine_id
  INNER JOIN reports r ON r.id = e.report_id
  LEFT JOIN machine_moving_sheets ms ON ms.machine_id = m.id
  SET
    e.inclusions_value_minor = (
      SELECT IF(COUNT(*) = 0, NULL, COALESCE(SUM(CASE WHEN i.currency = m.currency AND i.`condition` <> 'missing' THEN
        ROUND(i.replacement_cost_minor * CASE i.`condition` WHEN 'good' THEN 0.6 WHEN 'usable' THEN 0.4 WHEN 'worn' THEN 0.2 ELSE 0 END) END), 0))
      FROM machine_inclusions i WHERE i.machine_id = m.id),
    e.missing_tooling_minor = (
      SELECT IF(COUNT(*) = 0, NULL, COALESCE(SUM(CASE WHEN i.currency = m.currency AND i.`condition` = 'missing' THEN i.replacement_cost_minor END), 0))
      FROM machine_inclusions i WHERE i.machine_id = m.id),
    e.rigging_minor = comparison_rigging_minor(ms.weight_kg, ms.site_access),
    e.motor_kw = COALESCE(JSON_VALUE(r.result, '$.machine.motorPowerKw'), m.motor_kw)
  WHERE e.machine_id = changed_machine_id;
  -- A second statement: a multi-table UPDATE does not promise to assign left to right.
  UPDATE comparison_entries e
  INNER JOIN machines m ON m.id = e.machine_id
  INNER JOIN reports r ON r.id = e.report_id
  SET e.landed_base_minor = COALESCE(m.asking_price_minor, 0) + COALESCE(e.rigging_minor, 0) + COALESCE(e.missing_tooling_minor, 0)
    + IF(r.currency = m.currency, COALESCE(r.repair_estimate_minor, 0), 0)
  WHERE e.machine_id = changed_machine_id;
END;
--> statement-breakpoint
DROP PROCEDURE IF EXISTS comparison_entry_refresh;
--> statement-breakpoint
-- As in 0004, with the report's deal-breakers, the survey's nameplate supply, the listing date and
-- the inspection day (the result's, else the booked visit, the survey's submission or the release,
-- as the report page dates it), then the listing's figures.
CREATE PROCEDURE comparison_entry_refresh(IN changed_report_id INT)
BEGIN
  DECLARE changed_machine_id INT;
  DELETE FROM comparison_entries WHERE report_id = changed_report_id;
  INSERT INTO comparison_entries (report_id, inspection_id, machine_id, maker, model, lathe_kind, swing_mm, between_centres_mm, year_built, town, region, asking_price_minor, price_currency, overall_condition, overall_score, confidence, fair_market_value_minor, repair_estimate_minor, value_currency, released_at, bed_score, bed_grade, spindle_score, spindle_grade, gearbox_score, gearbox_grade, slides_score, slides_grade, tailstock_score, tailstock_grade, drive_score, drive_grade, electrical_score, electrical_grade, accessories_score, accessories_grade,
    deal_breaker_count, deal_breakers, supply_voltage, supply_phases, listed_at, inspected_on)
  SELECT r.id, r.inspection_id, r.machine_id, m.maker, m.model, m.lathe_kind, m.swing_mm, m.between_centres_mm, m.year_built, m.town, m.region, m.asking_price_minor, m.currency, r.overall_condition, r.overall_score, r.confidence, r.fair_market_value_minor, r.repair_estimate_minor, r.currency, r.released_at,
    MAX(CASE WHEN s.subsystem = 'bed-and-ways' THEN s.score END), MAX(CASE WHEN s.subsystem = 'bed-and-ways' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'spindle-and-headstock' THEN s.score END), MAX(CASE WHEN s.subsystem = 'spindle-and-headstock' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'gearbox-and-feeds' THEN s.score END), MAX(CASE WHEN s.subsystem = 'gearbox-and-feeds' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'slides-and-screws' THEN s.score END), MAX(CASE WHEN s.subsystem = 'slides-and-screws' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'tailstock' THEN s.score END), MAX(CASE WHEN s.subsystem = 'tailstock' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'drive' THEN s.score END), MAX(CASE WHEN s.subsystem = 'drive' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'electrical-and-safety' THEN s.score END), MAX(CASE WHEN s.subsystem = 'electrical-and-safety' THEN s.grade END),
    MAX(CASE WHEN s.subsystem = 'accessories' THEN s.score END), MAX(CASE WHEN s.subsystem = 'accessories' THEN s.grade END),
    COALESCE(JSON_LENGTH(r.result, '$.dealBreakers'), 0),
    COALESCE(REPLACE(REPLACE(REPLACE(REPLACE(JSON_EXTRACT(r.result, '$.dealBreakers[*].id'), '[', ''), ']', ''), '"', ''), ' ', ''), ''),
    IF(JSON_VALUE(sv.data, '$.machine.supply.phases') IN ('1', '3'), JSON_VALUE(sv.data, '$.machine.supply.voltage'), NULL),
    IF(JSON_VALUE(sv.data, '$.machine.supply.phases') IN ('1', '3') AND JSON_VALUE(sv.data, '$.machine.supply.voltage') IS NOT NULL, JSON_VALUE(sv.data, '$.machine.supply.phases'), NULL),
    m.created_at,
    COALESCE(LEFT(JSON_VALUE(r.result, '$.machine.inspectedOn'), 10), DATE(i.scheduled_at), DATE(sv.submitted_at), DATE(r.released_at), DATE(r.created_at))
  FROM reports r
  INNER JOIN machines m ON m.id = r.machine_id
  INNER JOIN inspections i ON i.id = r.inspection_id
  LEFT JOIN surveys sv ON sv.inspection_id = r.inspection_id
  LEFT JOIN report_subsystem_scores s ON s.report_id = r.id
  WHERE r.id = changed_report_id AND r.status = 'released' AND r.superseded_by_id IS NULL
  GROUP BY r.id;
  SELECT machine_id INTO changed_machine_id FROM comparison_entries WHERE report_id = changed_report_id;
  IF changed_machine_id IS NOT NULL THEN
    CALL comparison_entry_listing_refresh(changed_machine_id);
  END IF;
END;
--> statement-breakpoint
DROP TRIGGER IF EXISTS comparison_entries_machine_updated;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_machine_updated AFTER UPDATE ON machines FOR EACH ROW
BEGIN
  UPDATE comparison_entries SET
    maker = NEW.maker, model = NEW.model, lathe_kind = NEW.lathe_kind, swing_mm = NEW.swing_mm,
    between_centres_mm = NEW.between_centres_mm, year_built = NEW.year_built, town = NEW.town, region = NEW.region,
    asking_price_minor = NEW.asking_price_minor, price_currency = NEW.currency, listed_at = NEW.created_at
  WHERE machine_id = NEW.id;
  CALL comparison_entry_listing_refresh(NEW.id);
END;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_inclusion_inserted AFTER INSERT ON machine_inclusions FOR EACH ROW
BEGIN
  CALL comparison_entry_listing_refresh(NEW.machine_id);
END;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_inclusion_updated AFTER UPDATE ON machine_inclusions FOR EACH ROW
BEGIN
  CALL comparison_entry_listing_refresh(NEW.machine_id);
  IF OLD.machine_id <> NEW.machine_id THEN
    CALL comparison_entry_listing_refresh(OLD.machine_id);
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_inclusion_deleted AFTER DELETE ON machine_inclusions FOR EACH ROW
BEGIN
  CALL comparison_entry_listing_refresh(OLD.machine_id);
END;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_moving_sheet_inserted AFTER INSERT ON machine_moving_sheets FOR EACH ROW
BEGIN
  CALL comparison_entry_listing_refresh(NEW.machine_id);
END;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_moving_sheet_updated AFTER UPDATE ON machine_moving_sheets FOR EACH ROW
BEGIN
  CALL comparison_entry_listing_refresh(NEW.machine_id);
  IF OLD.machine_id <> NEW.machine_id THEN
    CALL comparison_entry_listing_refresh(OLD.machine_id);
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_moving_sheet_deleted AFTER DELETE ON machine_moving_sheets FOR EACH ROW
BEGIN
  CALL comparison_entry_listing_refresh(OLD.machine_id);
END;
--> statement-breakpoint
-- Fill the new columns for the reports already in the table.
CREATE PROCEDURE comparison_entries_refill()
BEGIN
  DECLARE done INT DEFAULT 0;
  DECLARE next_report_id INT;
  DECLARE current_reports CURSOR FOR SELECT id FROM reports WHERE status = 'released' AND superseded_by_id IS NULL;
  DECLARE CONTINUE HANDLER FOR NOT FOUND SET done = 1;
  OPEN current_reports;
  refill: LOOP
    FETCH current_reports INTO next_report_id;
    IF done THEN
      LEAVE refill;
    END IF;
    CALL comparison_entry_refresh(next_report_id);
  END LOOP;
  CLOSE current_reports;
END;
--> statement-breakpoint
CALL comparison_entries_refill();
--> statement-breakpoint
DROP PROCEDURE comparison_entries_refill;
