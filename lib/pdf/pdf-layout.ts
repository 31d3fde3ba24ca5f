/**
 * The layout the renderer prints today, recorded with each stored report PDF. Bump it whenever what
 * a report PDF shows changes (a new page, a new block, a colour). A stored file is never rendered
 * again: a released version keeps the file it was sealed with, whatever the layout is now.
 * 2: the seller's claims and landed cost page, cold/warm per section, darker faint ink.
 * 3: "1 of 1 check", not "checks".
 * 4: scores cut, not rounded, to one decimal, so none shows across its grade's edge.
 * 5: a provisional grade says so on the cover, with its reasons; a bed with a concave stretch
 *    beside a raised one is described as such.
 * 6: the valuation reads as a signed appraisal (premise, effective date, sales grid, cost approach,
 *    liquidation evidence, reconciliation, statement).
 */
export const REPORT_PDF_LAYOUT = 6;
