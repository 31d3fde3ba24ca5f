CREATE TABLE `report_pdf_jobs` (
	`report_id` int NOT NULL,
	`attempts` int NOT NULL DEFAULT 0,
	`next_attempt_at` datetime(3) NOT NULL,
	`last_error` text,
	`done_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `report_pdf_jobs_report_id` PRIMARY KEY(`report_id`)
);
--> statement-breakpoint
CREATE TABLE `report_pdfs` (
	`report_id` int NOT NULL,
	`sha256` char(64) NOT NULL,
	`byte_length` int NOT NULL,
	`pdf` longblob NOT NULL,
	`layout` smallint NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `report_pdfs_report_id` PRIMARY KEY(`report_id`)
);
--> statement-breakpoint
ALTER TABLE `reports` ADD `machine_snapshot` json;--> statement-breakpoint
ALTER TABLE `report_pdf_jobs` ADD CONSTRAINT `report_pdf_jobs_report_id_reports_id_fk` FOREIGN KEY (`report_id`) REFERENCES `reports`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `report_pdfs` ADD CONSTRAINT `report_pdfs_report_id_reports_id_fk` FOREIGN KEY (`report_id`) REFERENCES `reports`(`id`) ON DELETE no action ON UPDATE no action;
--> statement-breakpoint
-- A released report states its machine as it was at release (issue 14): what it says about the
-- machine is copied into machine_snapshot (lib/reports/machine-snapshot.ts, MachineSnapshot) and
-- every reader of a released version reads that copy. Versions released before this migration get
-- the listing as it stands now, the best record there is. The guard on released reports is lifted
-- for this one statement and put back with machine_snapshot among the guarded columns.
DROP TRIGGER IF EXISTS reports_released_immutable;
--> statement-breakpoint
UPDATE reports r
INNER JOIN machines m ON m.id = r.machine_id
SET r.machine_snapshot = JSON_OBJECT(
  'machineType', m.machine_type, 'latheKind', m.lathe_kind, 'maker', m.maker, 'model', m.model,
  'serialNumber', m.serial_number, 'yearBuilt', m.year_built, 'swingMm', m.swing_mm,
  'betweenCentresMm', m.between_centres_mm, 'spindleBoreMm', m.spindle_bore_mm, 'sizeClass', m.size_class,
  'motorKw', CAST(m.motor_kw AS DOUBLE), 'supplyVoltage', m.supply_voltage, 'supplyPhases', m.supply_phases,
  'town', m.town, 'region', m.region, 'askingPriceMinor', m.asking_price_minor, 'currency', m.currency,
  'accessories', m.accessories)
WHERE r.status <> 'draft' AND r.machine_snapshot IS NULL;
--> statement-breakpoint
ALTER TABLE `reports` ADD CONSTRAINT `reports_released_sealed` CHECK (status = 'draft' or machine_snapshot is not null);
--> statement-breakpoint
CREATE TRIGGER reports_released_immutable BEFORE UPDATE ON reports FOR EACH ROW
BEGIN
  IF OLD.status <> 'draft' AND (
       NEW.result <> OLD.result
    OR NEW.version <> OLD.version
    OR NEW.inspection_id <> OLD.inspection_id
    OR NEW.machine_id <> OLD.machine_id
    OR NEW.scoring_version <> OLD.scoring_version
    OR NEW.survey_version <> OLD.survey_version
    OR NEW.overall_condition <> OLD.overall_condition
    OR NEW.overall_score <> OLD.overall_score
    OR NEW.confidence <> OLD.confidence
    OR NEW.verification_code <> OLD.verification_code
    OR NOT (NEW.released_at <=> OLD.released_at)
    OR NOT (NEW.fair_market_value_minor <=> OLD.fair_market_value_minor)
    OR NOT (NEW.repair_estimate_minor <=> OLD.repair_estimate_minor)
    OR NOT (NEW.inspector_id <=> OLD.inspector_id)
    OR NOT (NEW.reviewer_id <=> OLD.reviewer_id)
    OR NOT (NEW.release_facts <=> OLD.release_facts)
    OR NOT (NEW.machine_snapshot <=> OLD.machine_snapshot)
    OR (OLD.status = 'withdrawn' AND NEW.status <> 'withdrawn')
  ) THEN
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'A released report cannot be changed; issue a new version instead';
  END IF;
END;
--> statement-breakpoint
-- The stored PDF of a released version is the file its SHA-256 vouches for: only a released (or
-- withdrawn) version gets one, and once stored it is never changed or removed.
CREATE TRIGGER report_pdfs_released_only BEFORE INSERT ON report_pdfs FOR EACH ROW
BEGIN
  IF (SELECT status FROM reports WHERE id = NEW.report_id) = 'draft' THEN
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'A draft report has no sealed file';
  END IF;
END;
--> statement-breakpoint
CREATE TRIGGER report_pdfs_immutable BEFORE UPDATE ON report_pdfs FOR EACH ROW
BEGIN
  SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'A released report''s file cannot be changed; issue a new version instead';
END;
--> statement-breakpoint
CREATE TRIGGER report_pdfs_undeletable BEFORE DELETE ON report_pdfs FOR EACH ROW
BEGIN
  SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'A released report''s file cannot be deleted';
END;
--> statement-breakpoint
-- The comparison table holds only current released versions, so its machine facts (maker, model,
-- kind, sizes, year, town, region, motor) come from the sealed copy; an edit of the listing now
-- reaches only the figures that are the listing's own today: asking price, currency, listing date,
-- and (through comparison_entry_listing_refresh) moving sheet and inclusions.
DROP TRIGGER IF EXISTS comparison_entries_machine_updated;
--> statement-breakpoint
CREATE TRIGGER comparison_entries_machine_updated AFTER UPDATE ON machines FOR EACH ROW
BEGIN
  UPDATE comparison_entries SET asking_price_minor = NEW.asking_price_minor, price_currency = NEW.currency, listed_at = NEW.created_at
  WHERE machine_id = NEW.id;
  CALL comparison_entry_listing_refresh(NEW.id);
END;
--> statement-breakpoint
DROP PROCEDURE IF EXISTS comparison_entry_listing_refresh;
--> statement-breakpoint
-- As in 0012, with the motor as sealed with the report when the survey's result does not give it.
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
    e.motor_kw = COALESCE(JSON_VALUE(r.result, '$.machine.motorPowerKw'), IF(r.machine_snapshot IS NULL, m.motor_kw, JSON_VALUE(r.machine_snapshot, '$.motorKw')))
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
-- As in 0012, with the machine's identity, sizes and location read from the copy sealed at release.
CREATE PROCEDURE comparison_entry_refresh(IN changed_report_id INT)
BEGIN
  DECLARE changed_machine_id INT;
  DELETE FROM comparison_entries WHERE report_id = changed_report_id;
  INSERT INTO comparison_entries (report_id, inspection_id, machine_id, maker, model, lathe_kind, swing_mm, between_centres_mm, year_built, town, region, asking_price_minor, price_currency, overall_condition, overall_score, confidence, fair_market_value_minor, repair_estimate_minor, value_currency, released_at, bed_score, bed_grade, spindle_score, spindle_grade, gearbox_score, gearbox_grade, slides_score, slides_grade, tailstock_score, tailstock_grade, drive_score, drive_grade, electrical_score, electrical_grade, accessories_score, accessories_grade,
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
    m.asking_price_minor, m.currency, r.overall_condition, r.overall_score, r.confidence, r.fair_market_value_minor, r.repair_estimate_minor, r.currency, r.released_at,
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
