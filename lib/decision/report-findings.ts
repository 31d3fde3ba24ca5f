import type { ScoringResult } from '@/lib/scoring';

export type ReportFindings = Pick<ScoringResult, 'dealBreakers' | 'notInspected' | 'provisional' | 'provisionalReasons'>;

/**
 * The deal-breakers, the list of what was not inspected and whether the grade is provisional, from the stored scoring result of one
 * report. Results stored before scoring 1.1 carry neither, and read as empty lists.
 */
export function findingsOf(result: Partial<ScoringResult> | null): ReportFindings {
  // Results scored before 1.2 carry no provisional flag: their grade was released as firm.
  return {
    dealBreakers: result?.dealBreakers ?? [],
    notInspected: result?.notInspected ?? [],
    provisional: result?.provisional === true,
    provisionalReasons: result?.provisionalReasons ?? [],
  };
}
