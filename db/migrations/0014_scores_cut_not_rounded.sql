-- Scores are stored as they are shown: cut, not rounded, to whole points (lib/scoring/grading/
-- condition-scale.ts, shownScore), so a figure beside a grade never crosses the grade's edge: an
-- overall score of 87.6 is "Very good" and is now stored as 87, not 88 beside a scale on which
-- "Excellent" starts at 88. The stored figures are an index of each report's scoring result, which
-- stays as it was; they are taken again from it here. The guard on released reports (0009) is lifted
-- for this one statement and put back unchanged; the comparison table follows through its triggers.
DROP TRIGGER IF EXISTS reports_released_immutable;
--> statement-breakpoint
UPDATE reports
SET overall_score = FLOOR(ROUND(JSON_VALUE(result, '$.overall.score'), 6))
WHERE JSON_VALUE(result, '$.overall.score') IS NOT NULL
  AND overall_score <> FLOOR(ROUND(JSON_VALUE(result, '$.overall.score'), 6));
--> statement-breakpoint
UPDATE report_subsystem_scores s
INNER JOIN reports r ON r.id = s.report_id
INNER JOIN JSON_TABLE(r.result, '$.subsystems[*]' COLUMNS (subsystem VARCHAR(40) PATH '$.id', score DOUBLE PATH '$.score')) j
  -- Subsystem ids are ASCII: compared as bytes, whatever collation the database was created with.
  ON CAST(j.subsystem AS BINARY) = CAST(s.subsystem AS BINARY)
SET s.score = FLOOR(ROUND(j.score, 6))
WHERE j.score IS NOT NULL AND s.score <> FLOOR(ROUND(j.score, 6));
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
    OR (OLD.status = 'withdrawn' AND NEW.status <> 'withdrawn')
  ) THEN
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'A released report cannot be changed; issue a new version instead';
  END IF;
END;
