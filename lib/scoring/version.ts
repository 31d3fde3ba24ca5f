/**
 * Versions stamped on every graded result. The app stores both beside each report so a released
 * report can always be traced to the exact rules that produced it (a correction is a new version).
 * Bump SCORING_VERSION whenever a limit, band edge, weight, cost or formula changes (the minor or
 * major part), or only the wording of an explanation (the patch part, as in 1.1.1: "1 of 1 check", and
 * subsystem and overall scores given in full, two decimals, so none reads across a grade's edge).
 * 1.2.0: units never change a verdict (lengths equal within the entry's resolution, scaled limits
 * rounded up, the precision-lathe minimum and step for toolroom lathes only); a concave stretch
 * anywhere fails the bed; hidden damage reaches the grade; areas not inspected are not graded;
 * provisional grades; set-up and service items apart from wear; two-collar limit 0.02 radial/300;
 * a deal-breaker holds the grade at Poor; the valuation by sales grid, breakdown cost approach,
 * liquidation evidence and a parts-or-rebuild premise for deal-breakers.
 */
export const SCORING_VERSION = '1.2.0';

/** Version of the on-site survey format the schema in survey/ describes. */
export const SURVEY_FORMAT_VERSION = 1 as const;
