import { eq } from 'drizzle-orm';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { surveys } from '@/db/schema';
import { draftSurveySchema } from '@/lib/survey/draft-survey-schema';
import { createAccount } from '../support/accounts';
import { sessionCookie } from '../support/private-stack';
import { bookedInspection } from './survey-fixtures';

/**
 * Hostile requests to the running app's JSON routes: bodies that are not JSON, JSON of every shape,
 * odd ids in the path and odd query strings. Every answer is a JSON refusal or success below 500,
 * and the survey stored at the end still passes the draft schema.
 */
const RUNS = Number(process.env.HTTP_FUZZ_RUNS ?? 1000);
const APP_URL = process.env.APP_URL ?? 'http://localhost:3100';

type Answer = { status: number; body: { ok?: boolean; code?: string } };
async function send(path: string, init: RequestInit): Promise<Answer> {
  const response = await fetch(`${APP_URL}${path}`, { ...init, redirect: 'manual', signal: AbortSignal.timeout(30_000) });
  const text = await response.text();
  let body: Answer['body'] = {};
  try {
    body = JSON.parse(text) as Answer['body'];
  } catch {
    throw new Error(`${init.method ?? 'GET'} ${path} answered ${response.status} with something that is not JSON: ${text.slice(0, 200)}`);
  }
  return { status: response.status, body };
}

function expectClearAnswer(answer: Answer, what: string) {
  expect(answer.status, what).toBeLessThan(500);
  if (answer.body.ok === false) expect(answer.body.code, what).not.toBe('internal');
}

const pathSegment = fc.oneof(
  fc.integer({ min: -5, max: 2 ** 40 }).map(String),
  fc.constantFrom('0', '-1', '1e3', '0x10', 'NaN', 'null', '%00', '..%2F..', '%27%20OR%201%3D1', '9'.repeat(40), '1.5'),
  // A bare "." or ".." segment is resolved by the client's URL parser before anything is sent
  // (it would test fetch, not the app), so those two are left out.
  fc.string({ minLength: 1, maxLength: 20 }).filter((s) => s !== '.' && s !== '..').map(encodeURIComponent),
);

const body = fc.oneof(
  { weight: 3, arbitrary: fc.jsonValue({ maxDepth: 4 }).map((v) => JSON.stringify(v)) },
  { weight: 3, arbitrary: fc.record({ baseVersion: fc.oneof(fc.integer(), fc.string(), fc.constant(null)), data: fc.jsonValue({ maxDepth: 4 }) }).map((v) => JSON.stringify(v)) },
  { weight: 1, arbitrary: fc.string({ maxLength: 200 }) },
  { weight: 1, arbitrary: fc.constantFrom('', '{', '{"baseVersion":1,"data":', 'null', '[]', '"text"', '{"__proto__":{"ok":true}}', '{"data":{"constructor":{"prototype":{"x":1}}}}') },
);

describe('the JSON routes under hostile requests', () => {
  let inspectorCookie: string;
  let dealerCookie: string;
  let inspectionId: number;

  beforeAll(async () => {
    const booked = await bookedInspection({ start: true });
    inspectionId = booked.inspectionId;
    inspectorCookie = await sessionCookie({ id: booked.inspector.id, role: 'inspector', name: booked.inspector.name ?? '', email: '', sessionVersion: 0 });
    const dealer = await createAccount('dealer');
    dealerCookie = await sessionCookie({ ...dealer, sessionVersion: 0 });
  });
  afterAll(() => closeDatabase());

  it(`PUT and GET /api/surveys/:id: ${RUNS} hostile requests each, clear answers only, stored survey still valid`, async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof(fc.constant(String(inspectionId)), pathSegment), body, async (id, payload) => {
        const put = await send(`/api/surveys/${id}`, { method: 'PUT', headers: { 'content-type': 'application/json', cookie: inspectorCookie }, body: payload });
        expectClearAnswer(put, `PUT /api/surveys/${id} ${payload.slice(0, 120)}`);
        const get = await send(`/api/surveys/${id}?${new URLSearchParams({ inspectionId: payload.slice(0, 30) })}`, { headers: { cookie: inspectorCookie } });
        expectClearAnswer(get, `GET /api/surveys/${id}`);
      }),
      { numRuns: RUNS },
    );
    const [stored] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
    expect(draftSurveySchema.safeParse(stored!.data).success).toBe(true);
  }, 600_000);

  it(`GET /api/compare: ${RUNS} hostile query strings, clear answers only`, async () => {
    const query = fc.dictionary(
      fc.oneof(fc.constantFrom('sort', 'dir', 'page', 'pageSize', 'maker', 'minSwing', 'maxSwing', 'grade', 'region', 'q', '__proto__'), fc.string({ maxLength: 10 })),
      fc.oneof(fc.string({ maxLength: 40 }), fc.integer().map(String), fc.constantFrom('-1', '1e9', 'NaN', "' OR 1=1 --", 'swing_mm; DROP TABLE machines', '%', '_')),
      { maxKeys: 6 },
    );
    await fc.assert(
      fc.asyncProperty(query, async (params) => {
        const search = new URLSearchParams(params).toString();
        const answer = await send(`/api/compare?${search}`, { headers: { cookie: dealerCookie } });
        expectClearAnswer(answer, `GET /api/compare?${search}`);
      }),
      { numRuns: RUNS },
    );
  }, 600_000);
});
