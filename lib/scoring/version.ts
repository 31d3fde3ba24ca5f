/**
 * Versions stamped on every graded result. The app stores both beside each report so a released
 * report can always be traced to the exact rules that produced it (a correction is a new version).
 * Bump SCORING_VERSION whenever a limit, band edge, weight, cost or formula changes (the minor or
 * major part), or only the wording of an explanation (the patch part, as in 1.1.1: "1 of 1 check", and
 * subsystem and overall scores given in full, two decimals, so none reads across a grade's edge).
 */
export const SCORING_VERSION = '1.1.1';

/** Version of the on-site survey format the schema in survey/ describes. */
export const SURVEY_FORMAT_VERSION = 1 as const;
