ALTER TABLE `comparison_entries` ADD `overall_provisional` boolean DEFAULT false NOT NULL;--> statement-breakpoint
DROP PROCEDURE IF EXISTS comparison_entry_refresh;
--> statement-breakpoint
-- As in 0015, with whether the grade is provisional, from the scoring result (absent before 1.2: firm).
CREATE PROCEDURE comparison_entry_refresh(IN changed_report_id INT)
BEGIN
  DECLARE changed_machine_id INT;
  DELETE FROM comparison_entries WHERE report_id = changed_report_id;
  INSERT INTO comparison_entries (report_id, inspection_id, machine_id, maker, model, lathe_kind, swing_mm, between_centres_mm, year_built, town, region, asking_price_minor, price_currency, overall_condition, overall_score, overall_provisional, confidence, fair_market_value_minor, repair_estimate_minor, value_currency, released_at, bed_score, bed_grade, spindle_score, spindle_grade, gearbox_score, gearbox_grade, slides_score, slides_grade, tailstock_score, tailstock_grade, drive_score, drive_grade, electrical_score, electrical_grade, accessories_score, accessories_grade,
    deal_breaker_count, deal_breakers, supply_voltage, supply_phases, listed_at, inspected_on)
  SELECT r.id, r.inspection_id, r.machine_id,
    IF(r.machine_snapshot IS NULL, m.maker, JSON_VALUE(r.machine_snapshot, '$.maker')),
    IF(r.machine_snapshot IS NULL, m.model, JSON_VALUE(r.machine_snapshot, '$.model')),
    IF(r.machine_snapshot IS NULL, m.lathe_kind, JSON_VALUE(r.machine_snapshot, '$.latheKind')),
    IF(r.machine_snapshot IS NULL, m.swing_mm, JSON_VALUE(r.machine_snapshot, '$.swingMm')),
    IF(r.machine_snapshot IS NULL, m.between_centres_mm, JSON_VALUE(r.machine_snapshot, '$.betweenCentresMm')),
    IF(r.machine_snapshot IS NULL, m.year_built, JSON_VALUE(r.machine_snapshot, '$.yearBuilt')),
    IF(r.machine_snapshot IS NULL, m.town, JSON_VALUE(r.machine_snapshot, '$.town')),
    IF(r.machine_snapshot IS NULL, m.region, JSON_VALUE(r.machine_snapshot, '$.region')),
    m.asking_price_minor, m.currency, r.overall_condition, r.overall_score, COALESCE(JSON_EXTRACT(r.result, '$.provisional') = 'true', FALSE), r.confidence, r.fair_market_value_minor, r.repair_estimate_minor, r.currency, r.released_at,
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
UPDATE comparison_entries e INNER JOIN reports r ON r.id = e.report_id
SET e.overall_provisional = COALESCE(JSON_EXTRACT(r.result, '$.provisional') = 'true', FALSE);
