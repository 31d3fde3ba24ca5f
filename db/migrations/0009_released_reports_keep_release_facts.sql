-- The facts copied at release (seller's disclosure, landed-cost basis, thermal state per section)
-- are part of the released evidence: once a report has left draft they may never change either.
-- Same rule as 0001, with release_facts added to the guarded columns.
DROP TRIGGER IF EXISTS reports_released_immutable;
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
