import type { ScoringResult } from '@/lib/scoring';

export type ReportFindings = Pick<ScoringResult, 'dealBreakers' | 'notInspected'>;

/**
 * The deal-breakers and the list of what was not inspected, from the stored scoring result of one
 * report. Results stored before scoring 1.1 carry neither, and read as empty lists.
 */
export function findingsOf(result: Partial<ScoringResult> | null): ReportFindings {
  return { dealBreakers: result?.dealBreakers ?? [], notInspected: result?.notInspected ?? [] };
}
