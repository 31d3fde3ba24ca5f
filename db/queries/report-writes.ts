import 'server-only';
import { and, eq, isNull, ne } from 'drizzle-orm';
import { reportAccessGrants, reportPdfJobs, reports, reportSubsystemScores } from '@/db/schema';
import type { Database } from '@/db/client';
import type { ScoringResult } from '@/lib/scoring';
import { newVerificationCode } from '@/lib/verification-code';
import { collectReleaseFacts } from './release-facts';
import { collectMachineSnapshot } from './machine-snapshot';
import { shownScore } from '@/lib/scoring/grading/condition-scale';

type Writer = Pick<Database, 'insert' | 'select' | 'update'>;

/** Stores a scored survey as a draft report (a new version when earlier ones exist). */
export async function insertDraftReport(
  tx: Writer,
  input: { inspectionId: number; machineId: number; surveyVersion: number; inspectorId: string | null; result: ScoringResult },
) {
  const { result } = input;
  const existing = await tx
    .select({ id: reports.id, version: reports.version, status: reports.status })
    .from(reports)
    .where(eq(reports.inspectionId, input.inspectionId));
  const openDraft = existing.find((r) => r.status === 'draft');
  const version = openDraft ? openDraft.version : Math.max(0, ...existing.map((r) => r.version)) + 1;
  const values = {
    inspectionId: input.inspectionId,
    machineId: input.machineId,
    version,
    status: 'draft' as const,
    scoringVersion: result.scoringVersion,
    surveyFormatVersion: result.surveyFormatVersion,
    surveyVersion: input.surveyVersion,
    result,
    overallCondition: result.overall.condition ?? 'Salvage',
    // Stored as shown (cut, not rounded), so the figure beside the grade never crosses its edge.
    overallScore: shownScore(result.overall.score ?? 0),
    confidence: result.confidence.value.toFixed(3),
    safetyFindings: result.safetyFindings.length,
    fairMarketValueMinor: result.valuation.reconciliation?.fairMarketValue.amountMinor ?? result.valuation.costApproach?.fairMarketValue.amountMinor ?? null,
    repairEstimateMinor: result.repairEstimate.total.amountMinor,
    currency: result.valuation.currency,
    inspectorId: input.inspectorId,
  };
  let reportId: number;
  if (openDraft) {
    // A draft is rescored in place until it is released.
    await tx.update(reports).set(values).where(eq(reports.id, openDraft.id));
    reportId = openDraft.id;
  } else {
    const [row] = await tx.insert(reports).values({ ...values, verificationCode: newVerificationCode() }).$returningId();
    reportId = row!.id;
  }
  await replaceSubsystemScores(tx as Pick<Database, 'insert' | 'delete'> & Writer, reportId, result);
  return { reportId, version };
}

async function replaceSubsystemScores(tx: Pick<Database, 'insert' | 'delete'>, reportId: number, result: ScoringResult) {
  await tx.delete(reportSubsystemScores).where(eq(reportSubsystemScores.reportId, reportId));
  await tx.insert(reportSubsystemScores).values(
    result.subsystems.map((s) => ({
      reportId,
      subsystem: s.id,
      score: s.score === null ? null : shownScore(s.score),
      grade: s.grade,
    })),
  );
}

/**
 * Releases a draft: what it states about the machine is sealed with it, earlier released versions are
 * marked superseded, the seller gets free access, and its PDF is queued to be rendered once and stored.
 */
export async function releaseDraftReport(tx: Writer, input: { reportId: number; reviewerId: string; sellerId: string; at?: Date }) {
  const at = input.at ?? new Date();
  const [draft] = await tx.select().from(reports).where(and(eq(reports.id, input.reportId), eq(reports.status, 'draft')));
  if (!draft) return null;
  // The facts set beside the findings are copied with the release: the trigger keeps them as they are.
  const result = (typeof draft.result === 'string' ? JSON.parse(draft.result) : draft.result) as ScoringResult;
  const releaseFacts = await collectReleaseFacts(tx, { machineId: draft.machineId, inspectionId: draft.inspectionId, motorPowerKw: result.machine.motorPowerKw });
  const machineSnapshot = await collectMachineSnapshot(tx, draft.machineId);
  if (!machineSnapshot) return null;
  await tx.update(reports).set({ status: 'released', releasedAt: at, reviewerId: input.reviewerId, releaseFacts, machineSnapshot }).where(eq(reports.id, draft.id));
  await tx
    .update(reports)
    .set({ supersededById: draft.id })
    .where(and(eq(reports.inspectionId, draft.inspectionId), eq(reports.status, 'released'), ne(reports.id, draft.id), isNull(reports.supersededById)));
  await tx.insert(reportAccessGrants).values({ reportId: draft.id, userId: input.sellerId, reason: 'owner', grantedAt: at });
  await tx.insert(reportPdfJobs).values({ reportId: draft.id, nextAttemptAt: at });
  return { ...draft, machineSnapshot };
}
