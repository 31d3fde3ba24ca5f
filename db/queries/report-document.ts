import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import { db } from '@/db/client';
import { machines, photos, reports, users } from '@/db/schema';
import type { ScoringResult } from '@/lib/scoring';
import { parseReleaseFacts } from '@/lib/decision/release-facts';
import { parseMachineSnapshot } from '@/lib/reports/machine-snapshot';
import { sealedMachineOf } from './sealed-machine';

const inspector = alias(users, 'inspector');
const reviewer = alias(users, 'reviewer');

/** One report version with its machine, the people who signed it and the survey's photos. */
export async function findReportForDocument(reportId: number) {
  const [row] = await db
    .select({
      id: reports.id,
      inspectionId: reports.inspectionId,
      machineId: reports.machineId,
      version: reports.version,
      status: reports.status,
      result: reports.result,
      releaseFacts: reports.releaseFacts,
      machineSnapshot: reports.machineSnapshot,
      verificationCode: reports.verificationCode,
      releasedAt: reports.releasedAt,
      inspectorName: inspector.name,
      reviewerName: reviewer.name,
      machine: {
        maker: machines.maker,
        model: machines.model,
        serialNumber: machines.serialNumber,
        yearBuilt: machines.yearBuilt,
        swingMm: machines.swingMm,
        betweenCentresMm: machines.betweenCentresMm,
        spindleBoreMm: machines.spindleBoreMm,
        motorKw: machines.motorKw,
        latheKind: machines.latheKind,
        town: machines.town,
        region: machines.region,
      },
    })
    .from(reports)
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .leftJoin(inspector, eq(inspector.id, reports.inspectorId))
    .leftJoin(reviewer, eq(reviewer.id, reports.reviewerId))
    .where(eq(reports.id, reportId))
    .limit(1);
  if (!row) return null;
  const photoRows = await db
    .select({ section: photos.section, caption: photos.caption, originalUrl: photos.originalUrl, displayKey: photos.displayKey, fileKey: photos.fileKey })
    .from(photos)
    .where(eq(photos.inspectionId, row.inspectionId))
    .orderBy(asc(photos.createdAt), asc(photos.id));
  // A released version states the machine as sealed with it; a draft as the listing stands.
  const sealed = parseMachineSnapshot(row.machineSnapshot);
  return {
    ...row,
    result: row.result as ScoringResult,
    releaseFacts: parseReleaseFacts(row.releaseFacts),
    machine: sealed
      ? {
          maker: sealed.maker,
          model: sealed.model,
          serialNumber: sealed.serialNumber,
          yearBuilt: sealed.yearBuilt,
          swingMm: sealed.swingMm,
          betweenCentresMm: sealed.betweenCentresMm,
          spindleBoreMm: sealed.spindleBoreMm,
          motorKw: sealed.motorKw,
          latheKind: sealed.latheKind,
          town: sealed.town,
          region: sealed.region,
        }
      : { ...row.machine, motorKw: row.machine.motorKw === null ? null : Number(row.machine.motorKw) },
    photos: photoRows,
  };
}

export type ReportForDocument = NonNullable<Awaited<ReturnType<typeof findReportForDocument>>>;

/** The facts the download check needs: which version, in which state, of which inspection. */
export async function findReportVersion(reportId: number) {
  const [row] = await db
    .select({ id: reports.id, version: reports.version, status: reports.status, ...pickNames(sealedMachineOf()) })
    .from(reports)
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .where(eq(reports.id, reportId))
    .limit(1);
  return row ?? null;
}

const pickNames = ({ maker, model, serialNumber }: ReturnType<typeof sealedMachineOf>) => ({ maker, model, serialNumber });
