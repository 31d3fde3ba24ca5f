import { eq, inArray } from 'drizzle-orm';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { machines, surveys } from '@/db/schema';
import type { Actor, Operation, OperationResult } from '@/lib/auth/operation';
import { draftSurveySchema } from '@/lib/survey/draft-survey-schema';
import { saveSurvey } from '@/lib/survey/server/save-survey';
import { machineFormSchema } from '@/lib/validation/machine';
import { createMachine, updateMachine } from '@/lib/workflow/machines';
import { cancelInspection, requestInspection } from '@/lib/workflow/inspections';
import { sendSurveyBack } from '@/lib/workflow/review';
import { createAccount } from '../support/accounts';
import { bookedInspection } from './survey-fixtures';

/**
 * Thousands of hostile or malformed inputs through the operations behind the forms and JSON routes.
 * Every answer must be a success or a clear refusal — never "internal" (a 500) and never
 * "unavailable" while the database is up — and whatever was stored must pass the same schema the
 * form uses.
 */
const RUNS = Number(process.env.FUZZ_RUNS ?? 1000);
const REFUSALS = new Set(['invalid_input', 'forbidden', 'not_found', 'conflict', 'unauthenticated', 'rate_limited']);

const INJECTION = [
  "'; DROP TABLE machines; --",
  "' OR '1'='1",
  '" OR ""="',
  '<script>alert(1)</script>',
  '<img src=x onerror=alert(1)>',
  '{{7*7}}',
  '${7*7}',
  '../../../../etc/passwd',
  '\u0000',
  '\u202Egnp.exe',
  '\uD800',
  'Ω≈ç√∫˜µ≤≥÷',
  '🛠️🔩'.repeat(200),
  'x'.repeat(70_000),
  '__proto__',
  'constructor',
  '1e309',
  '-0',
  'NaN',
  '0x10',
  ' ',
];

/** Values a JSON body or a form can carry, leaning towards the ones that break parsers. */
const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(...INJECTION),
  fc.string({ unit: 'binary', maxLength: 200 }),
  fc.integer(),
  fc.constantFrom(0, -1, 2 ** 31, 2 ** 53, Number.MAX_SAFE_INTEGER + 2, 1e308, Number.NaN, Infinity, -Infinity, 0.5),
  fc.double(),
  fc.boolean(),
  fc.constant(null),
  fc.constant(undefined),
  fc.array(fc.string({ maxLength: 10 }), { maxLength: 5 }),
  fc.dictionary(fc.string({ maxLength: 8 }), fc.string({ maxLength: 8 }), { maxKeys: 4 }),
  fc.jsonValue({ maxDepth: 3 }),
);

/** A valid input with one or more fields replaced or removed, an unknown field added, or anything at all. */
function hostileInput(valid: Record<string, unknown>): fc.Arbitrary<unknown> {
  const keys = Object.keys(valid);
  const mutated = fc
    .record({
      replace: fc.subarray(keys, { minLength: 1 }),
      values: fc.array(hostileValue, { minLength: keys.length, maxLength: keys.length }),
      drop: fc.boolean(),
      extra: fc.option(fc.tuple(fc.constantFrom('__proto__', 'constructor', 'sellerId', 'id', 'role', 'status'), hostileValue)),
    })
    .map(({ replace, values, drop, extra }) => {
      const raw: Record<string, unknown> = { ...valid };
      replace.forEach((key, i) => {
        if (drop && i === 0) delete raw[key];
        else raw[key] = values[i];
      });
      if (extra) Object.defineProperty(raw, extra[0], { value: extra[1], enumerable: true, configurable: true, writable: true });
      return raw;
    });
  return fc.oneof({ weight: 4, arbitrary: mutated }, { weight: 1, arbitrary: fc.anything({ maxDepth: 3 }) });
}

function expectNoFault(result: OperationResult<unknown>, raw: unknown) {
  if (!result.ok) {
    expect(REFUSALS.has(result.code), `answered ${result.code} (${result.message}) to ${JSON.stringify(raw)?.slice(0, 300)}`).toBe(true);
    expect(result.message.length).toBeGreaterThan(0);
  }
}

async function fuzz(operation: Operation<never, unknown>, actor: Actor, valid: Record<string, unknown>, onSuccess?: (data: unknown) => void) {
  let accepted = 0;
  await fc.assert(
    fc.asyncProperty(hostileInput(valid), async (raw) => {
      const result = await operation.execute(actor, raw);
      expectNoFault(result, raw);
      if (result.ok) {
        accepted += 1;
        onSuccess?.(result.data);
      }
    }),
    { numRuns: RUNS },
  );
  return accepted;
}

const validMachine = {
  maker: 'Harlow',
  model: 'HL-300',
  serialNumber: 'H3-0421',
  latheKind: 'general_purpose',
  yearBuilt: '2004',
  swingMm: '300',
  betweenCentresMm: '750',
  spindleBoreMm: '38',
  motorKw: '4',
  supplyVoltage: '400',
  supplyPhases: '3',
  town: 'Brenmark',
  region: 'Brenmark valley',
  askingPrice: '8500',
  accessories: 'Three-jaw chuck',
  description: 'Runs; ways lightly scored near the chuck.',
  listingStatus: 'draft',
};

describe('operations under hostile input', () => {
  let seller: Actor;

  beforeAll(async () => {
    seller = (await createAccount('seller')).actor;
    expect(machineFormSchema.safeParse(validMachine).success, 'the base listing is valid').toBe(true);
  });
  afterAll(() => closeDatabase());

  it(`listing a machine: ${RUNS} inputs, no faults, and every stored listing passes the listing form's schema`, async () => {
    const created: number[] = [];
    const accepted = await fuzz(createMachine as never, seller, validMachine, (data) => created.push((data as { machineId: number }).machineId));
    // Some of the mutated inputs are still valid (a blank optional field, a number as a number).
    expect(accepted).toBeGreaterThan(0);
    const rows = await db.select().from(machines).where(inArray(machines.id, created));
    expect(rows).toHaveLength(created.length);
    for (const row of rows) {
      expect(row.sellerId).toBe(seller.id);
      const reread = machineFormSchema.safeParse({
        ...row,
        serialNumber: row.serialNumber ?? '',
        accessories: row.accessories ?? '',
        description: row.description ?? '',
        askingPrice: row.askingPriceMinor === null ? undefined : row.askingPriceMinor / 100,
        motorKw: row.motorKw ?? undefined,
      });
      expect(reread.success, `stored listing ${row.id} fails the schema: ${JSON.stringify(reread.error?.issues)}`).toBe(true);
    }
  }, 240_000);

  it(`editing a listing: ${RUNS} inputs, no faults, and another seller's listing is never changed`, async () => {
    const [own] = await db.insert(machines).values({ sellerId: seller.id, maker: 'Harlow', model: 'own', swingMm: 300, betweenCentresMm: 750, sizeClass: 'small', town: 'Brenmark', region: 'Brenmark valley' }).$returningId();
    const other = await createAccount('seller');
    const [theirs] = await db.insert(machines).values({ sellerId: other.id, maker: 'Harlow', model: 'theirs', swingMm: 300, betweenCentresMm: 750, sizeClass: 'small', town: 'Brenmark', region: 'Brenmark valley' }).$returningId();
    const [before] = await db.select().from(machines).where(eq(machines.id, theirs!.id));
    await fuzz(updateMachine as never, seller, { ...validMachine, machineId: own!.id });
    await fuzz(updateMachine as never, seller, { ...validMachine, machineId: theirs!.id });
    const [after] = await db.select().from(machines).where(eq(machines.id, theirs!.id));
    expect(after).toEqual(before);
  }, 240_000);

  it(`survey autosave: ${RUNS} inputs, no faults, and the stored draft always passes the draft schema`, async () => {
    const { inspector, inspectionId } = await bookedInspection({ start: true });
    const [start] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
    const base = start!.data as Record<string, unknown>;
    let version = start!.version;
    const surveyArbitrary = fc.oneof(
      hostileInput({ inspectionId, baseVersion: version, data: base }),
      // Hostile values inside the survey itself, one section at a time.
      hostileInput(base).map((data) => ({ inspectionId, baseVersion: -1, data })),
    );
    await fc.assert(
      fc.asyncProperty(surveyArbitrary, async (raw) => {
        // Aim most saves at the current version, so accepted saves are exercised as well as conflicts.
        const input = raw && typeof raw === 'object' && (raw as { baseVersion?: unknown }).baseVersion === -1 ? { ...(raw as object), baseVersion: version } : raw;
        const result = await saveSurvey.execute(inspector, input);
        expectNoFault(result, input);
        if (result.ok) version = result.data.version;
      }),
      { numRuns: RUNS },
    );
    const [end] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
    expect(end!.version).toBe(version);
    // Some of the hostile drafts are still valid drafts (a section left out, a note of odd text).
    expect(version).toBeGreaterThan(start!.version);
    const parsed = draftSurveySchema.safeParse(end!.data);
    expect(parsed.success, JSON.stringify(parsed.error?.issues?.slice(0, 3))).toBe(true);
  }, 240_000);

  it(`requesting, cancelling and sending back inspections: ${RUNS} inputs each, no faults`, async () => {
    const { inspectionId, machineId } = await bookedInspection();
    const tomorrow = new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);
    await fuzz(requestInspection as never, seller, { machineId, preferredDates: [tomorrow], siteAccessNotes: 'Gate B', siteContactName: 'Ana', siteContactPhone: '+44 1632 960000' });
    await fuzz(cancelInspection as never, seller, { inspectionId, reason: 'Machine sold privately' });
    const coordinator = (await createAccount('admin')).actor;
    await fuzz(sendSurveyBack as never, coordinator, { inspectionId, reportId: 1, comment: 'Measure the tailstock again' });
  }, 360_000);
});
