import { setTimeout as sleep } from 'node:timers/promises';
import { and, desc, eq, gt } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { emailOutbox, reports, surveys } from '@/db/schema';
import type { LatheSurvey } from '@/lib/scoring';
import { saveSurvey } from '@/lib/survey/server/save-survey';
import { submitSurvey } from '@/lib/survey/server/submit-survey';
import nearNew from '@/lib/scoring/examples/near-new.json';
import { bookedInspection, recordedPhoto } from './survey-fixtures';

const ROUNDS = Number(process.env.RACE_ROUNDS ?? 40);

let outboxBefore = 0;

beforeAll(async () => {
  const [last] = await db.select({ id: emailOutbox.id }).from(emailOutbox).orderBy(desc(emailOutbox.id)).limit(1);
  outboxBefore = last?.id ?? 0;
});

afterAll(async () => {
  // Each submission mails every coordinator the test database has gathered: hundreds of mails to
  // invented addresses that would keep the running app's outbox busy for minutes after this file.
  await db.delete(emailOutbox).where(and(gt(emailOutbox.id, outboxBefore), eq(emailOutbox.template, 'survey-submitted')));
  await closeDatabase();
});

describe('an autosave racing the submission of the same survey', () => {
  it('never acknowledges both when the save is missing from the survey that was scored', async () => {
    const bothAcknowledged: number[] = [];
    let saves = 0;
    let submits = 0;
    for (let round = 0; round < ROUNDS; round += 1) {
      const { inspector, inspectionId, machineId } = await bookedInspection({ start: true });
      await recordedPhoto(inspectionId, machineId, inspector.id);
      const first = await saveSurvey.execute(inspector, { inspectionId: String(inspectionId), baseVersion: 1, data: nearNew as LatheSurvey });
      expect(first).toEqual({ ok: true, data: { version: 2 } });

      const notes = `Late note, round ${round}`;
      // The save starts a little later each round, so it lands before, inside and after the submission.
      const [save, submit] = await Promise.all([
        sleep(round % 8).then(() =>
          saveSurvey.execute(inspector, { inspectionId: String(inspectionId), baseVersion: 2, data: { ...(nearNew as LatheSurvey), notes } }),
        ),
        submitSurvey.execute(inspector, { inspectionId: String(inspectionId), baseVersion: 2 }),
      ]);
      if (save.ok) saves += 1;
      if (submit.ok) submits += 1;
      expect(save.ok || (!save.ok && save.code === 'conflict')).toBe(true);
      expect(submit.ok || (!submit.ok && submit.code === 'conflict')).toBe(true);

      const [stored] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
      if (save.ok) expect((stored!.data as LatheSurvey).notes).toBe(notes);
      if (submit.ok) {
        const [report] = await db.select({ surveyVersion: reports.surveyVersion }).from(reports).where(eq(reports.inspectionId, inspectionId));
        // The report is scored from the version the survey row holds, which nothing changes after submission.
        expect(report!.surveyVersion).toBe(stored!.version);
        expect(stored!.submittedAt).not.toBeNull();
      }
      if (save.ok && submit.ok) bothAcknowledged.push(round);
    }
    expect(bothAcknowledged).toEqual([]);
    // Each round one of the two wins: a refused submission is sent again by the phone on the new version.
    expect(saves + submits).toBe(ROUNDS);
  });
});
