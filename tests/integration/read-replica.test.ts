import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import mysql from 'mysql2/promise';
import type { LatheSurvey } from '@/lib/scoring';
import nearNew from '@/lib/scoring/examples/near-new.json';
import { PrivateApp, ReplicatedDatabases, freePort, sessionCookie } from '../support/private-stack';

/**
 * Scaling out with read replicas (DATABASE_REPLICA_URLS): a primary and a replica MariaDB of this
 * file's own, joined by MariaDB's own replication, and an app server of its own reading from the
 * replica and writing to the primary. While the replica is held behind (its applier stopped), what
 * the app answers shows which server it read: the comparison table comes from the replica, a survey
 * autosave lands on the primary, its version rule is checked there, and the replica receives the
 * save once it applies again.
 */
type Fixture = {
  reportId: number;
  machineId: number;
  dealer: { id: string; role: string; name: string; email: string; sessionVersion: number };
  buyer: { id: string; role: string; name: string; email: string; sessionVersion: number };
  inspector: { id: string; role: string; name: string; email: string; sessionVersion: number };
  inspectionId: number;
};
type SaveAnswer = { ok: boolean; code?: string; data?: { version: number }; current?: { version: number } | null };
type ComparisonAnswer = { ok: boolean; data: { rows: Array<{ machineId: number; model: string }>; total: number } };

describe('read replicas: reads from the replica, writes to the primary', () => {
  const databases = new ReplicatedDatabases(`replica_${process.pid}`);
  let app: PrivateApp;
  let primary: mysql.Connection;
  let replica: mysql.Connection;
  let fixture: Fixture;
  let dealerCookie: string;
  let inspectorCookie: string;

  async function storedSurvey(connection: mysql.Connection) {
    const [rows] = await connection.query<mysql.RowDataPacket[]>('SELECT version, data FROM surveys WHERE inspection_id = ?', [fixture.inspectionId]);
    const data = typeof rows[0]!.data === 'string' ? (JSON.parse(rows[0]!.data) as LatheSurvey) : (rows[0]!.data as LatheSurvey);
    return { version: rows[0]!.version as number, notes: data.notes };
  }

  async function comparisonModel() {
    const response = await fetch(`${app.url}/api/compare?q=${encodeURIComponent('CL-330')}`, { headers: { cookie: dealerCookie }, signal: AbortSignal.timeout(30_000) });
    if (response.status !== 200) throw new Error(`the comparison API answered ${response.status}: ${await response.text()}\n${app.output.slice(-3000)}`);
    const answer = (await response.json()) as ComparisonAnswer;
    return answer.data.rows.find((row) => row.machineId === fixture.machineId)?.model;
  }

  async function save(baseVersion: number, notes: string) {
    const response = await fetch(`${app.url}/api/surveys/${fixture.inspectionId}`, {
      method: 'PUT',
      headers: { 'content-type': 'application/json', cookie: inspectorCookie },
      body: JSON.stringify({ baseVersion, data: { ...(nearNew as LatheSurvey), notes } }),
      signal: AbortSignal.timeout(30_000),
    });
    return { status: response.status, body: (await response.json()) as SaveAnswer };
  }

  beforeAll(async () => {
    await databases.start();
    databases.primary.migrate();
    // The rows the test uses, written to the primary only; the replica gets them by replication.
    fixture = JSON.parse(databases.primary.runScript('tests/support/replica-fixture.ts').trim().split('\n').at(-1)!) as Fixture;
    await databases.caughtUp();
    primary = await mysql.createConnection({ uri: databases.primary.url, timezone: 'Z' });
    replica = await mysql.createConnection({ uri: databases.replica.url, timezone: 'Z' });
    dealerCookie = await sessionCookie(fixture.dealer);
    inspectorCookie = await sessionCookie(fixture.inspector);
    app = new PrivateApp(await freePort(), databases.primary.url, { DATABASE_REPLICA_URLS: databases.replica.url, MAIL_WORKER_INTERVAL_MS: '0' });
    await app.start();
  }, 300_000);

  afterAll(async () => {
    await app?.stop();
    await primary?.end().catch(() => {});
    await replica?.end().catch(() => {});
    await databases.remove();
  }, 240_000);

  it('has replicated the primary: the released report and the survey are on both servers', async () => {
    for (const connection of [primary, replica]) {
      const [entries] = await connection.query<mysql.RowDataPacket[]>('SELECT model FROM comparison_entries WHERE machine_id = ?', [fixture.machineId]);
      expect(entries.map((e) => e.model as string)).toEqual(['CL-330 replica']);
      expect((await storedSurvey(connection)).version).toBe(1);
    }
  });

  it('refuses writes on the replica from the app’s account, so a write routed there would fail loudly', async () => {
    await expect(replica.query('UPDATE surveys SET version = version + 1 WHERE inspection_id = ?', [fixture.inspectionId])).rejects.toThrow(/read-only/);
  });

  it('serves the comparison table from the replica', async () => {
    expect(await comparisonModel()).toBe('CL-330 replica');
    databases.pauseApplying();
    try {
      // A change the replica has not applied yet: the primary and the replica now disagree.
      await primary.query('UPDATE comparison_entries SET model = ? WHERE machine_id = ?', ['CL-330 changed on the primary', fixture.machineId]);
      const [onReplica] = await replica.query<mysql.RowDataPacket[]>('SELECT model FROM comparison_entries WHERE machine_id = ?', [fixture.machineId]);
      expect(onReplica[0]!.model).toBe('CL-330 replica');
      // The app answers with the replica's row, several times over (the pool has several connections).
      for (let i = 0; i < 5; i += 1) expect(await comparisonModel()).toBe('CL-330 replica');
    } finally {
      databases.resumeApplying();
    }
    await databases.caughtUp();
    expect(await comparisonModel()).toBe('CL-330 changed on the primary');
  });

  it('writes survey autosaves to the primary and checks their version there while the replica lags; the replica receives them', async () => {
    databases.pauseApplying();
    try {
      const first = await save(1, 'Saved while the replica lags');
      expect(first).toMatchObject({ status: 200, body: { ok: true, data: { version: 2 } } });
      expect(await storedSurvey(primary)).toEqual({ version: 2, notes: 'Saved while the replica lags' });
      expect((await storedSurvey(replica)).version).toBe(1);

      // The next save names version 2, which only the primary has: accepted, because the version
      // rule reads the primary.
      const second = await save(2, 'Second save, replica still behind');
      expect(second).toMatchObject({ status: 200, body: { ok: true, data: { version: 3 } } });

      // A device still on version 1 is refused, and told the primary's current version.
      const stale = await save(1, 'From a device that missed two saves');
      expect(stale.status).toBe(409);
      expect(stale.body).toMatchObject({ ok: false, code: 'conflict', current: { version: 3 } });

      // Reopening the survey hands the phone the primary's version, the base of its next save.
      const read = await fetch(`${app.url}/api/surveys/${fixture.inspectionId}`, { headers: { cookie: inspectorCookie }, signal: AbortSignal.timeout(30_000) });
      expect(((await read.json()) as { data: { version: number } }).data.version).toBe(3);
      const page = await fetch(`${app.url}/jobs/${fixture.inspectionId}/survey`, { headers: { cookie: inspectorCookie }, redirect: 'manual', signal: AbortSignal.timeout(30_000) });
      expect(page.status).toBe(200);
      expect(await page.text()).toContain('Second save, replica still behind');
      expect((await storedSurvey(replica)).version).toBe(1);
    } finally {
      databases.resumeApplying();
    }
    await databases.caughtUp();
    expect(await storedSurvey(replica)).toEqual({ version: 3, notes: 'Second save, replica still behind' });
    expect(await storedSurvey(primary)).toEqual({ version: 3, notes: 'Second save, replica still behind' });
  });

  it('lets a buyer download a report the moment the grant is written, before the replica has it', async () => {
    const download = () => fetch(`${app.url}/api/reports/${fixture.reportId}/pdf`, { headers: { cookie: buyerCookie }, signal: AbortSignal.timeout(120_000) });
    const buyerCookie = await sessionCookie(fixture.buyer);
    expect((await download()).status).toBe(404);
    databases.pauseApplying();
    try {
      // As the payment webhook does: the grant is written to the primary; the replica is behind.
      await primary.query("INSERT INTO report_access_grants (report_id, user_id, reason) VALUES (?, ?, 'purchase')", [fixture.reportId, fixture.buyer.id]);
      const [onReplica] = await replica.query<mysql.RowDataPacket[]>('SELECT id FROM report_access_grants WHERE user_id = ?', [fixture.buyer.id]);
      expect(onReplica).toEqual([]);
      const response = await download();
      expect(response.status).toBe(200);
      expect(response.headers.get('content-type')).toBe('application/pdf');
    } finally {
      databases.resumeApplying();
    }
    await databases.caughtUp();
  }, 120_000);
});
