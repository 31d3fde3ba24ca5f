import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import mysql from 'mysql2/promise';
import { PrivateApp, PrivateDatabase, freePort, poll, sessionCookie } from '../support/private-stack';

/**
 * Faults on a MariaDB and an app server of this file's own (never the shared ones): the database
 * stopped under load, and the app server killed with SIGKILL in the middle of a burst of autosaves.
 */
type Survey = { surveyFormatVersion: 1; machineType: 'centre-lathe'; notes?: string };

describe('faults: database outage and app server crash', () => {
  const database = new PrivateDatabase(`fault_${process.pid}`);
  let app: PrivateApp;
  let sql: mysql.Connection;
  let cookie: string;
  let inspectorId: string;

  async function connect() {
    sql = await mysql.createConnection({ uri: database.url, timezone: 'Z' });
  }

  /** An inspector with visits under way, straight in the private database. */
  async function inspectionsOnSite(count: number) {
    const tag = randomUUID().slice(0, 8);
    const sellerId = randomUUID();
    await sql.query('INSERT INTO users (id, name, email, role) VALUES (?, ?, ?, ?)', [sellerId, `Seller ${tag}`, `seller-${tag}@fault-tests.example`, 'seller']);
    const ids: number[] = [];
    for (let i = 0; i < count; i += 1) {
      const [machine] = await sql.query<mysql.ResultSetHeader>(
        'INSERT INTO machines (seller_id, maker, model, swing_mm, between_centres_mm, size_class, town, region, listing_status) VALUES (?, ?, ?, 300, 750, ?, ?, ?, ?)',
        [sellerId, 'Harlow', `HL-300 ${tag}-${i}`, 'small', 'Brenmark', 'Brenmark valley', 'listed'],
      );
      const [inspection] = await sql.query<mysql.ResultSetHeader>(
        'INSERT INTO inspections (machine_id, requested_by_id, status, inspector_id, scheduled_at) VALUES (?, ?, ?, ?, UTC_TIMESTAMP())',
        [machine.insertId, sellerId, 'on_site', inspectorId, ],
      );
      await sql.query('INSERT INTO surveys (inspection_id, format_version, data, version, updated_by_id) VALUES (?, 1, ?, 1, ?)', [
        inspection.insertId,
        JSON.stringify({ surveyFormatVersion: 1, machineType: 'centre-lathe' }),
        inspectorId,
      ]);
      ids.push(inspection.insertId);
    }
    return ids;
  }

  type Answer = { status: number; body: { ok: boolean; code?: string; message?: string; data?: { version: number }; current?: { version: number } | null } };
  async function save(inspectionId: number, baseVersion: number, data: Survey): Promise<Answer> {
    const response = await fetch(`${app.url}/api/surveys/${inspectionId}`, {
      method: 'PUT',
      headers: { 'content-type': 'application/json', cookie },
      body: JSON.stringify({ baseVersion, data }),
      signal: AbortSignal.timeout(30_000),
    });
    return { status: response.status, body: (await response.json()) as Answer['body'] };
  }

  beforeAll(async () => {
    await database.start();
    database.migrate();
    await connect();
    inspectorId = randomUUID();
    const tag = inspectorId.slice(0, 8);
    await sql.query('INSERT INTO users (id, name, email, role, email_verified) VALUES (?, ?, ?, ?, UTC_TIMESTAMP())', [inspectorId, `Inspector ${tag}`, `inspector-${tag}@fault-tests.example`, 'inspector']);
    cookie = await sessionCookie({ id: inspectorId, role: 'inspector', name: `Inspector ${tag}`, email: `inspector-${tag}@fault-tests.example`, sessionVersion: 0 });
    app = new PrivateApp(await freePort(), database.url);
    await app.start();
  }, 300_000);

  afterAll(async () => {
    await app?.stop();
    await sql?.end().catch(() => {});
    await database.remove();
  }, 240_000);

  it('answers 503 "unavailable" quickly while the database is stopped, and recovers by itself when it is back', async () => {
    const [inspectionId] = await inspectionsOnSite(1);
    let version = 1;
    const first = await save(inspectionId!, version, { surveyFormatVersion: 1, machineType: 'centre-lathe', notes: 'before the outage' });
    expect(first).toMatchObject({ status: 200, body: { ok: true } });
    version = first.body.data!.version;

    // Load while the database goes away: saves keep coming from the phone.
    let stopLoad = false;
    const answers: Array<{ status: number; code?: string; ms: number }> = [];
    const load = (async () => {
      while (!stopLoad) {
        const started = Date.now();
        const { status, body } = await save(inspectionId!, version, { surveyFormatVersion: 1, machineType: 'centre-lathe', notes: `load ${answers.length}` }).catch((): Answer => ({ status: 0, body: { ok: false, code: 'no answer' } }));
        if (body.ok && body.data) version = body.data.version;
        // A save that committed as the database went away may have lost its answer: the 409 then
        // names the server's version, and the next save builds on it, as the phone would.
        if (status === 409 && body.current) version = body.current.version;
        answers.push({ status, code: body.code, ms: Date.now() - started });
      }
    })();
    await poll('a few saves before the outage', async () => answers.filter((a) => a.status === 200).length >= 3);
    await sql.end();
    await database.stop();

    const outageFrom = answers.length;
    await poll('five answers during the outage', async () => answers.length - outageFrom >= 6);
    const during = answers.slice(outageFrom + 1);
    for (const answer of during) {
      expect(answer).toMatchObject({ status: 503, code: 'unavailable' });
      // Fails fast: the phone keeps its edits and retries; no request hangs on a dead database.
      expect(answer.ms).toBeLessThan(10_000);
    }
    const outage = await save(inspectionId!, version, { surveyFormatVersion: 1, machineType: 'centre-lathe', notes: 'during' });
    expect(outage.body.message).toMatch(/cannot reach its database/);

    // A page during the outage answers promptly and does not sign the inspector out (its status
    // is sent before the streamed body fails, so the page's error boundary says what happened).
    const page = await fetch(`${app.url}/jobs/${inspectionId}/survey`, { headers: { cookie }, redirect: 'manual', signal: AbortSignal.timeout(30_000) });
    expect(page.headers.get('location') ?? '').not.toContain('/sign-in');
    await page.arrayBuffer();

    await database.start();
    // The same app server, not restarted, saves again once the database is back.
    await poll('saves succeeding again', async () => answers.slice(-2).every((a) => a.status === 200) && answers.length > outageFrom + 8).catch((error: Error) => {
      throw new Error(`${error.message}; last answers: ${JSON.stringify(answers.slice(-4))}`);
    });
    stopLoad = true;
    await load;
    await connect();
    const [rows] = await sql.query<mysql.RowDataPacket[]>('SELECT version, data FROM surveys WHERE inspection_id = ?', [inspectionId]);
    expect(rows[0]!.version).toBe(version);
  }, 300_000);

  it('keeps every acknowledged autosave, whole, when the app server is killed with SIGKILL mid-burst', async () => {
    // Independent of the test before: the database is up and this file's connection is open.
    await database.start();
    await sql.end().catch(() => {});
    await connect();
    const inspectionIds = await inspectionsOnSite(4);
    const acknowledged = new Map<number, { version: number; notes: string }>();
    const sent = new Map<string, string>(); // `${inspectionId}:${version}` → notes of that save
    let killed = false;
    let acks = 0;

    // Four phones, each saving one version after another, as fast as the server answers.
    const phones = inspectionIds.map(async (inspectionId) => {
      let version = 1;
      for (let n = 0; !killed; n += 1) {
        const notes = `${inspectionId}/${n} ${'spindle runout 0.01 mm; '.repeat(40)}`;
        sent.set(`${inspectionId}:${version + 1}`, notes);
        const answer = await save(inspectionId, version, { surveyFormatVersion: 1, machineType: 'centre-lathe', notes }).catch(() => null);
        if (!answer || answer.status !== 200) break;
        version = answer.body.data!.version;
        acknowledged.set(inspectionId, { version, notes });
        acks += 1;
      }
    });
    await poll('a burst of acknowledged saves', async () => acks >= 40);
    killed = true;
    await app.kill();
    await Promise.all(phones);

    await app.start();
    for (const inspectionId of inspectionIds) {
      const [rows] = await sql.query<mysql.RowDataPacket[]>('SELECT version, data FROM surveys WHERE inspection_id = ?', [inspectionId]);
      const row = rows[0]!;
      const data = typeof row.data === 'string' ? (JSON.parse(row.data) as Survey) : (row.data as Survey);
      const ack = acknowledged.get(inspectionId)!;
      // Nothing acknowledged is lost: the stored version is the last acknowledged one, or one
      // later whose answer the kill cut off.
      expect(row.version).toBeGreaterThanOrEqual(ack.version);
      expect(row.version).toBeLessThanOrEqual(ack.version + 1);
      // None half-written: the stored data is exactly what was sent for that version.
      expect(data).toEqual({ surveyFormatVersion: 1, machineType: 'centre-lathe', notes: sent.get(`${inspectionId}:${row.version}`) });
    }
    // And the restarted server carries on from there.
    const [id] = inspectionIds;
    const [rows] = await sql.query<mysql.RowDataPacket[]>('SELECT version FROM surveys WHERE inspection_id = ?', [id]);
    const after = await save(id!, rows[0]!.version as number, { surveyFormatVersion: 1, machineType: 'centre-lathe', notes: 'after the restart' });
    expect(after).toMatchObject({ status: 200, body: { ok: true } });
  }, 300_000);
});
