// The authorisation matrix: every route handler and every server action the app has, called as
// each role and signed out, must be allowed or refused exactly as the rules below say.
//
// How it works:
// - Discovery reads app/ from disk: every route.ts (its exported HTTP methods), every module that
//   starts with 'use server' (its exported functions), and every file with an inline 'use server'
//   function. Each one needs an entry in RULES; an entry without a rule, or a rule for something
//   that no longer exists, fails the matrix.
// - Server actions and route handlers are imported and called in this process, exactly as Next.js
//   would call them; only the session lookup (lib/auth/current-actor) is replaced by the actor under
//   test, and Next's cache revalidation is a no-op outside a request. Everything after that — the
//   wrapper's role check, input parsing, ownership, the transaction and the audit row — is the real
//   code against the real database. Resolving a real session cookie is covered over HTTP by the
//   end-to-end tests (tests/e2e/accounts.test.ts, tests/e2e/shell.test.ts).
// - "Refused" means: 401/403 (signed out, wrong role), or a "not found" that the wrapper recorded as
//   a denied audit event (ownership). Any other answer, including a business-rule refusal such as
//   "already booked", means the caller got past authorisation.
//
// Adding a route or action: add a line to RULES with the roles that may call it and an input that
// is valid for an allowed caller (inputs receive the acting account, so ownership can be set up).
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { randomInt } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { and, count, eq, gt } from 'drizzle-orm';
import { NextRequest } from 'next/server';
import { closeDatabase, db } from '@/db/client';
import { auditEvents, inspections, machineInclusions, machines, reportAccessGrants, reports, shortlists, users } from '@/db/schema';
import { ERROR_CODES } from '@/lib/errors';
import { ROLES, type Role } from '@/db/schema/users';
import type { InspectionStatus } from '@/db/schema/inspections';
import type { Actor } from '@/lib/auth/operation';
import { issueToken } from '@/lib/auth/one-time-tokens';
import { createAccount, TEST_PASSWORD, uniqueEmail, type TestAccount } from '../support/accounts';
import { createAgedReleasedReport } from '../support/reinspection-fixtures';

const session = vi.hoisted(() => ({ actor: null as Actor | null, ip: '198.51.100.1' }));
vi.mock('@/lib/auth/current-actor', () => ({
  currentActor: async () => session.actor,
  currentClientIp: async () => session.ip,
}));
vi.mock('next/cache', async (importOriginal) => ({
  ...(await importOriginal<typeof import('next/cache')>()),
  revalidatePath: () => undefined,
  revalidateTag: () => undefined,
}));

type Subject = Role | 'signed-out';
const SUBJECTS: readonly Subject[] = [...ROLES, 'signed-out'];
const ANYONE = SUBJECTS;
const SIGNED_IN: readonly Subject[] = ROLES;

/** What an input builder gets: the acting account (null when signed out) and the shared fixtures. */
type Context = { actor: TestAccount | null; fx: Fixtures };
type Input = (c: Context) => unknown | Promise<unknown>;
type HttpCall = { url: string; method?: string; body?: unknown; params: Record<string, string> };

type Rule =
  /**
   * A server action or routeHandler route: called as every subject. `form: true` for actions used
   * with useActionState, called as (previousState, FormData) like React calls them.
   */
  | { kind: 'action'; allowed: readonly Subject[]; input: Input; form?: boolean; others?: { allowed: readonly Subject[]; input: Input } }
  /** A webhook authenticated by its signature alone: refused without one, whoever's session comes along. */
  | { kind: 'signed'; request: (c: Context) => HttpCall | Promise<HttpCall>; why: string }
  | { kind: 'route'; allowed: readonly Subject[]; request: (c: Context) => HttpCall | Promise<HttpCall>; others?: { allowed: readonly Subject[]; request: (c: Context) => HttpCall | Promise<HttpCall> } }
  /** A third-party protocol handler whose authorisation is one of our operations: that operation is called as every subject. */
  | { kind: 'delegated'; allowed: readonly Subject[]; operation: () => Promise<{ execute: (actor: Actor | null, raw: unknown) => Promise<{ ok: boolean; code?: string }> }>; input: Input; why: string }
  /** Auth.js's own sign-in/sign-out machinery, open to everyone by nature; exercised end to end. */
  | { kind: 'auth-library'; why: string }
  /** An inline server action inside a page that touches no data. */
  | { kind: 'inline'; why: string };

// ── fixtures ────────────────────────────────────────────────────────────────────────────────────

type Fixtures = {
  accounts: Record<Role, TestAccount>;
  otherSeller: TestAccount;
  otherInspector: TestAccount;
  otherDealer: TestAccount;
};

let fx: Fixtures;
const someIp = () => `198.51.100.${randomInt(1, 254)}`;

async function newMachine(sellerId: string) {
  const [row] = await db
    .insert(machines)
    .values({ sellerId, maker: 'Matrixwerk', model: `MX-${randomInt(100, 999)}`, swingMm: 330, betweenCentresMm: 1000, sizeClass: 'medium', town: 'Lowmere', region: 'Brenmark', listingStatus: 'listed' })
    .$returningId();
  return row!.id;
}

async function newInclusion(sellerId: string) {
  const machineId = await newMachine(sellerId);
  const [row] = await db.insert(machineInclusions).values({ machineId, kind: 'chuck', description: 'Matrix chuck', condition: 'good' }).$returningId();
  return row!.id;
}

async function newInspection(sellerId: string, status: InspectionStatus, inspectorId: string | null = null) {
  const machineId = await newMachine(sellerId);
  const [row] = await db
    .insert(inspections)
    .values({ machineId, requestedById: sellerId, status, inspectorId, scheduledAt: inspectorId ? new Date(Date.now() + 86_400_000) : null, siteContactName: 'Matrix Contact', siteContactPhone: '+00 555 0100' })
    .$returningId();
  return row!.id;
}

async function unconfirmedUser() {
  return (await createAccount('buyer', { confirmed: false })).id;
}

async function invitedUser() {
  const account = await createAccount('inspector');
  await db.update(users).set({ passwordHash: null, emailVerified: null }).where(eq(users.id, account.id));
  return account.id;
}

/**
 * Released reports of two different inspections from the demo data: the first is granted to the
 * acting account, the second never is (a grant covers every version of one inspection's report).
 */
async function releasedReport(which: 'granted' | 'never-granted', grantTo?: TestAccount | null) {
  const released = await db.select({ id: reports.id, inspectionId: reports.inspectionId }).from(reports).where(eq(reports.status, 'released')).orderBy(reports.id);
  const first = released[0];
  const other = released.find((report) => report.inspectionId !== first?.inspectionId);
  if (!first || !other) throw new Error('The matrix needs released reports of two inspections (the demo seed has several)');
  if (which === 'never-granted') return other.id;
  if (grantTo) await db.insert(reportAccessGrants).values({ reportId: first.id, userId: grantTo.id, reason: 'purchase' });
  return first.id;
}

async function newShortlist(ownerId: string) {
  const [row] = await db.insert(shortlists).values({ ownerId, name: `Matrix list ${randomInt(1, 1e9)}` }).$returningId();
  return row!.id;
}

const tokenFor = (purpose: 'verify_email' | 'reset_password' | 'invitation', userId: string) => issueToken(db, userId, purpose);

/** The seller's own record when a seller acts, the fixture seller's otherwise. */
const sellerOf = (c: Context) => (c.actor?.role === 'seller' ? c.actor : c.fx.accounts.seller);
const comparerOf = (c: Context) => (c.actor?.role === 'dealer' || c.actor?.role === 'admin' ? c.actor : c.fx.accounts.dealer);
const inspectorOf = (c: Context) => (c.actor?.role === 'inspector' ? c.actor : c.fx.accounts.inspector);
const tomorrow = () => new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);

const INCLUSION_FORM = { kind: 'chuck', description: '250 mm 3-jaw chuck', condition: 'good', replacementCost: 600 };
const DISCLOSURE_FORM = { hasKnownFaults: 'no', hasRepairs: 'no', hasCrashes: 'no', usage: 'hobby', supplyVoltage: 400, supplyPhases: 3, included: 'Chuck', saleTerm: 'as-is' };
const MACHINE_FORM = { maker: 'Matrixwerk', model: 'MX-330', latheKind: 'general_purpose', swingMm: 330, betweenCentresMm: 1000, town: 'Lowmere', region: 'Brenmark', listingStatus: 'draft' };
// The smallest survey draft the survey format accepts.
const SURVEY_DRAFT = { surveyFormatVersion: 1, machineType: 'centre-lathe' };
const REQUEST_FORM = { preferredDates: [tomorrow()], siteContactName: 'Matrix Contact', siteContactPhone: '+00 555 0100' };

// ── the rules ───────────────────────────────────────────────────────────────────────────────────

const RULES: Record<string, Rule> = {
  // Auth.js and the sign-in/out actions: sign-in must be reachable signed out; sign-out by anyone.
  'app/api/auth/[...nextauth]/route.ts#GET': { kind: 'auth-library', why: 'Auth.js endpoints (CSRF token, session, providers); tests/e2e/accounts.test.ts signs in over HTTP' },
  'app/api/auth/[...nextauth]/route.ts#POST': { kind: 'auth-library', why: 'Auth.js credentials callback with its CSRF check; rate limits in tests/integration/sign-in-rate-limit.test.ts' },
  'app/(auth)/sign-in/actions.ts#signInAction': { kind: 'auth-library', why: 'calls Auth.js signIn; tests/e2e/accounts.test.ts and shell.test.ts' },
  'app/(backoffice)/sign-out-action.ts#signOutAction': { kind: 'auth-library', why: 'calls Auth.js signOut; tests/e2e/shell.test.ts' },
  'app/verify/page.tsx#inline': { kind: 'inline', why: 'report-code look-up: only redirects to /verify/<code>, reads and writes nothing' },

  // Accounts: the public steps of signing up and recovering access.
  'app/(auth)/sign-up/actions.ts#signUpAction': {
    kind: 'action',
    allowed: ANYONE,
    input: () => ({ role: 'seller', name: 'Matrix Person', businessName: 'Matrix Works', town: 'Lowmere', region: 'Brenmark', email: uniqueEmail('signup'), password: TEST_PASSWORD, passwordAgain: TEST_PASSWORD }),
  },
  'app/(auth)/confirm-email/actions.ts#confirmEmailAction': { kind: 'action', allowed: ANYONE, input: async () => ({ token: await tokenFor('verify_email', await unconfirmedUser()) }) },
  'app/(auth)/confirm-email/actions.ts#resendConfirmationAction': { kind: 'action', allowed: ANYONE, input: () => ({ email: uniqueEmail('resend') }) },
  'app/(auth)/forgot-password/actions.ts#requestPasswordResetAction': { kind: 'action', allowed: ANYONE, input: () => ({ email: uniqueEmail('forgot') }) },
  'app/(auth)/reset-password/actions.ts#resetPasswordAction': {
    kind: 'action',
    allowed: ANYONE,
    input: async () => ({ token: await tokenFor('reset_password', (await createAccount('seller')).id), password: TEST_PASSWORD, passwordAgain: TEST_PASSWORD }),
  },
  'app/(auth)/invitation/actions.ts#acceptInvitationAction': {
    kind: 'action',
    allowed: ANYONE,
    input: async () => ({ token: await tokenFor('invitation', await invitedUser()), password: TEST_PASSWORD, passwordAgain: TEST_PASSWORD }),
  },
  // The new password equals the old one so the fixture accounts keep working.
  'app/(backoffice)/account/actions.ts#changePasswordAction': { kind: 'action', allowed: SIGNED_IN, input: () => ({ currentPassword: TEST_PASSWORD, password: TEST_PASSWORD, passwordAgain: TEST_PASSWORD }) },

  // People: coordinators only.
  'app/(backoffice)/admin/people/actions.ts#inviteUserAction': { kind: 'action', allowed: ['admin'], input: () => ({ name: 'Matrix Inspector', email: uniqueEmail('invite'), role: 'inspector' }) },
  'app/(backoffice)/admin/people/actions.ts#changeRoleAction': { kind: 'action', allowed: ['admin'], input: async () => ({ userId: (await createAccount('buyer')).id, role: 'dealer' }) },
  'app/(backoffice)/admin/people/actions.ts#deactivateAccountAction': { kind: 'action', allowed: ['admin'], input: async () => ({ userId: (await createAccount('buyer')).id }) },
  'app/(backoffice)/admin/people/actions.ts#reactivateAccountAction': { kind: 'action', allowed: ['admin'], input: async () => ({ userId: (await createAccount('buyer', { deactivated: true })).id }) },

  'app/(backoffice)/account/shop-supply-actions.ts#saveShopSupplyAction': { kind: 'action', allowed: ['buyer', 'dealer'], input: () => ({ supplyVoltage: 230, supplyPhases: 1 }) },

  'app/(backoffice)/admin/fees/validity-actions.ts#setReportValidityAction': { kind: 'action', allowed: ['admin'], input: () => ({ validityDays: 90 }) },
  // Machines and requests: sellers, and only for their own machines.
  'app/(backoffice)/machines/actions.ts#createMachineAction': { kind: 'action', allowed: ['seller'], input: () => MACHINE_FORM },
  'app/(backoffice)/machines/actions.ts#updateMachineAction': {
    kind: 'action',
    allowed: ['seller'],
    input: async (c) => ({ ...MACHINE_FORM, machineId: await newMachine(sellerOf(c).id) }),
    others: { allowed: [], input: async (c) => ({ ...MACHINE_FORM, machineId: await newMachine(c.fx.otherSeller.id) }) },
  },
  'app/(backoffice)/machines/actions.ts#requestInspectionAction': {
    kind: 'action',
    allowed: ['seller'],
    input: async (c) => ({ ...REQUEST_FORM, machineId: await newMachine(sellerOf(c).id) }),
    others: { allowed: [], input: async (c) => ({ ...REQUEST_FORM, machineId: await newMachine(c.fx.otherSeller.id) }) },
  },
  'app/(backoffice)/machines/[machineId]/disclosure/actions.ts#saveDisclosureAction': {
    kind: 'action',
    allowed: ['seller'],
    input: async (c) => ({ ...DISCLOSURE_FORM, machineId: await newMachine(sellerOf(c).id) }),
    others: { allowed: [], input: async (c) => ({ ...DISCLOSURE_FORM, machineId: await newMachine(c.fx.otherSeller.id) }) },
  },
  'app/(backoffice)/machines/[machineId]/moving/actions.ts#saveMovingSheetAction': {
    kind: 'action',
    allowed: ['seller'],
    input: async (c) => ({ weightKg: 1850, heavyEnd: 'headstock', siteAccess: 'ground-level-wide', machineId: await newMachine(sellerOf(c).id) }),
    others: { allowed: [], input: async (c) => ({ weightKg: 1850, heavyEnd: 'headstock', siteAccess: 'ground-level-wide', machineId: await newMachine(c.fx.otherSeller.id) }) },
  },
  'app/(backoffice)/machines/[machineId]/inclusions/actions.ts#addInclusionAction': {
    kind: 'action',
    allowed: ['seller'],
    input: async (c) => ({ ...INCLUSION_FORM, machineId: await newMachine(sellerOf(c).id) }),
    others: { allowed: [], input: async (c) => ({ ...INCLUSION_FORM, machineId: await newMachine(c.fx.otherSeller.id) }) },
  },
  'app/(backoffice)/machines/[machineId]/inclusions/actions.ts#removeInclusionAction': {
    kind: 'action',
    allowed: ['seller'],
    input: async (c) => ({ inclusionId: await newInclusion(sellerOf(c).id) }),
    others: { allowed: [], input: async (c) => ({ inclusionId: await newInclusion(c.fx.otherSeller.id) }) },
  },
  'app/(backoffice)/machines/actions.ts#setListingStatusAction': {
    kind: 'action',
    allowed: ['seller'],
    input: async (c) => ({ machineId: await newMachine(sellerOf(c).id), listingStatus: 'withdrawn' }),
    others: { allowed: [], input: async (c) => ({ machineId: await newMachine(c.fx.otherSeller.id), listingStatus: 'withdrawn' }) },
  },
  'app/(backoffice)/machines/actions.ts#cancelInspectionAction': {
    kind: 'action',
    allowed: ['seller', 'admin'],
    input: async (c) => ({ inspectionId: await newInspection(sellerOf(c).id, 'requested'), reason: 'Machine sold privately' }),
    others: { allowed: ['admin'], input: async (c) => ({ inspectionId: await newInspection(c.fx.otherSeller.id, 'requested'), reason: 'Machine sold privately' }) },
  },

  // Coordination and review: coordinators.
  'app/(backoffice)/inspections/actions.ts#bookInspectionAction': {
    kind: 'action',
    allowed: ['admin'],
    input: async (c) => ({ inspectionId: await newInspection(c.fx.accounts.seller.id, 'requested'), inspectorId: c.fx.accounts.inspector.id, date: tomorrow(), time: '09:30', feeEuros: 290 }),
  },
  'app/(backoffice)/inspections/actions.ts#cancelBookingAction': {
    kind: 'action',
    allowed: ['seller', 'admin'],
    input: async (c) => ({ inspectionId: await newInspection(sellerOf(c).id, 'booked', c.fx.accounts.inspector.id), reason: 'Workshop closed that week' }),
    others: { allowed: ['admin'], input: async (c) => ({ inspectionId: await newInspection(c.fx.otherSeller.id, 'booked', c.fx.accounts.inspector.id), reason: 'Workshop closed that week' }) },
  },
  'app/(backoffice)/inspections/actions.ts#releaseReportAction': { kind: 'action', allowed: ['admin'], input: async (c) => ({ inspectionId: await newInspection(c.fx.accounts.seller.id, 'in_review', c.fx.accounts.inspector.id), reportId: 1 }) },
  'app/(backoffice)/inspections/actions.ts#sendSurveyBackAction': {
    kind: 'action',
    allowed: ['admin'],
    input: async (c) => ({ inspectionId: await newInspection(c.fx.accounts.seller.id, 'in_review', c.fx.accounts.inspector.id), reportId: 1, comment: 'Measure the tailstock again' }),
  },
  'app/(backoffice)/inspections/actions.ts#reopenForCorrectionAction': {
    kind: 'action',
    allowed: ['admin'],
    input: async (c) => ({ inspectionId: await newInspection(c.fx.accounts.seller.id, 'released', c.fx.accounts.inspector.id), comment: 'Correct the bed reading' }),
  },

  // The inspector's visit and survey: only the inspector assigned to that inspection.
  'app/(backoffice)/jobs/[inspectionId]/actions.ts#startVisitAction': {
    kind: 'action',
    allowed: ['inspector'],
    input: async (c) => newInspection(c.fx.accounts.seller.id, 'booked', inspectorOf(c).id),
    others: { allowed: [], input: async (c) => newInspection(c.fx.accounts.seller.id, 'booked', c.fx.otherInspector.id) },
  },
  'app/(backoffice)/jobs/[inspectionId]/actions.ts#submitSurveyAction': {
    kind: 'action',
    allowed: ['inspector'],
    input: async (c) => ({ inspectionId: await newInspection(c.fx.accounts.seller.id, 'on_site', inspectorOf(c).id), baseVersion: 0 }),
    others: { allowed: [], input: async (c) => ({ inspectionId: await newInspection(c.fx.accounts.seller.id, 'on_site', c.fx.otherInspector.id), baseVersion: 0 }) },
  },
  'app/api/surveys/[inspectionId]/route.ts#GET': {
    kind: 'route',
    allowed: ['inspector'],
    request: async (c) => {
      const id = await newInspection(c.fx.accounts.seller.id, 'on_site', inspectorOf(c).id);
      return { url: `/api/surveys/${id}`, params: { inspectionId: String(id) } };
    },
    others: {
      allowed: [],
      request: async (c) => {
        const id = await newInspection(c.fx.accounts.seller.id, 'on_site', c.fx.otherInspector.id);
        return { url: `/api/surveys/${id}`, params: { inspectionId: String(id) } };
      },
    },
  },
  'app/api/surveys/[inspectionId]/route.ts#PUT': {
    kind: 'route',
    allowed: ['inspector'],
    request: async (c) => {
      const id = await newInspection(c.fx.accounts.seller.id, 'on_site', inspectorOf(c).id);
      return { url: `/api/surveys/${id}`, method: 'PUT', body: { baseVersion: 0, data: SURVEY_DRAFT }, params: { inspectionId: String(id) } };
    },
    others: {
      allowed: [],
      request: async (c) => {
        const id = await newInspection(c.fx.accounts.seller.id, 'on_site', c.fx.otherInspector.id);
        return { url: `/api/surveys/${id}`, method: 'PUT', body: { baseVersion: 0, data: SURVEY_DRAFT }, params: { inspectionId: String(id) } };
      },
    },
  },
  // Payments and reports.
  // Fee and refund inputs are deliberately refused by validation for a coordinator (no real fee or
  // order changes); validation comes after the role check, so the role is still what is judged.
  'app/(backoffice)/admin/fees/actions.ts#saveFeeAction': { kind: 'action', form: true, allowed: ['admin'], input: () => ({ sizeClass: 'medium', amount: '-1' }) },
  'app/(backoffice)/admin/orders/actions.ts#refundOrderAction': { kind: 'action', form: true, allowed: ['admin'], input: () => ({ orderId: '999999999', reason: 'x' }) },
  // Market data feeds every valuation: the coordinator's inputs are refused by validation so no sale is added.
  'app/(backoffice)/admin/market/actions.ts#recordComparableSaleAction': { kind: 'action', allowed: ['admin'], input: () => ({ description: '' }) },
  'app/(backoffice)/admin/market/actions.ts#importComparableSalesAction': { kind: 'action', allowed: ['admin'], input: () => ({ csv: '' }) },
  // A current report (inspected 5 days ago): allowed callers get past authorisation to the "still current" refusal.
  'app/(backoffice)/reports/[id]/reinspection-actions.ts#requestReinspectionAction': {
    kind: 'action',
    form: true,
    allowed: ['buyer', 'dealer', 'seller'],
    input: async (c) => ({ reportId: String((await createAgedReleasedReport({ seller: sellerOf(c), inspectedDaysAgo: 5 })).reportId) }),
    others: { allowed: ['buyer', 'dealer'], input: async (c) => ({ reportId: String((await createAgedReleasedReport({ seller: c.fx.otherSeller, inspectedDaysAgo: 5 })).reportId) }) },
  },
  'app/(backoffice)/reports/[id]/actions.ts#buyReportAction': { kind: 'action', form: true, allowed: ['buyer', 'dealer'], input: () => ({ reportId: '999999999' }) },
  'app/api/reports/[id]/pdf/route.ts#GET': {
    kind: 'route',
    allowed: SIGNED_IN,
    request: async (c) => {
      const id = await releasedReport('granted', c.actor);
      return { url: `/api/reports/${id}/pdf`, params: { id: String(id) } };
    },
    others: {
      allowed: ['admin'],
      request: async () => {
        const id = await releasedReport('never-granted');
        return { url: `/api/reports/${id}/pdf`, params: { id: String(id) } };
      },
    },
  },
  'app/api/payments/webhook/route.ts#POST': {
    kind: 'signed',
    why: "the payment provider's signature over the body is the only credential; services/payments and the payment tests cover signed events",
    request: () => ({ url: '/api/payments/webhook', method: 'POST', body: { id: 'evt_forged', type: 'checkout.session.completed' }, params: {} }),
  },
  // Comparison: dealers and coordinators; shortlists only by their owner.
  'app/api/compare/route.ts#GET': { kind: 'route', allowed: ['dealer', 'admin'], request: () => ({ url: '/api/compare', params: {} }) },
  'app/api/compare/export/route.ts#GET': { kind: 'route', allowed: ['dealer', 'admin'], request: () => ({ url: '/api/compare/export', params: {} }) },
  'app/(backoffice)/compare/actions.ts#createShortlistAction': {
    kind: 'action',
    allowed: ['dealer', 'admin'],
    input: async (c) => ({ name: `Matrix list ${randomInt(1, 1e9)}`, machineIds: [await newMachine(c.fx.accounts.seller.id)] }),
  },
  'app/(backoffice)/compare/actions.ts#addToShortlistAction': {
    kind: 'action',
    allowed: ['dealer', 'admin'],
    input: async (c) => ({ shortlistId: await newShortlist(comparerOf(c).id), machineIds: [await newMachine(c.fx.accounts.seller.id)] }),
    others: { allowed: [], input: async (c) => ({ shortlistId: await newShortlist(c.fx.otherDealer.id), machineIds: [await newMachine(c.fx.accounts.seller.id)] }) },
  },
  'app/(backoffice)/compare/actions.ts#removeFromShortlistAction': {
    kind: 'action',
    allowed: ['dealer', 'admin'],
    input: async (c) => ({ shortlistId: await newShortlist(comparerOf(c).id), machineId: await newMachine(c.fx.accounts.seller.id) }),
    others: { allowed: [], input: async (c) => ({ shortlistId: await newShortlist(c.fx.otherDealer.id), machineId: await newMachine(c.fx.accounts.seller.id) }) },
  },
  'app/(backoffice)/compare/actions.ts#deleteShortlistAction': {
    kind: 'action',
    allowed: ['dealer', 'admin'],
    input: async (c) => ({ shortlistId: await newShortlist(comparerOf(c).id) }),
    others: { allowed: [], input: async (c) => ({ shortlistId: await newShortlist(c.fx.otherDealer.id) }) },
  },
  'app/api/uploadthing/route.ts#GET': {
    kind: 'delegated',
    allowed: ['inspector'],
    why: "uploadthing's handler: GET serves the upload routes' public config; uploads are admitted by survey.photo.authorize in the router's middleware",
    operation: async () => (await import('@/lib/survey/server/survey-photo-access')).authorizeSurveyPhoto,
    input: async (c) => ({ inspectionId: await newInspection(c.fx.accounts.seller.id, 'on_site', inspectorOf(c).id), section: 'identity' }),
  },
  'app/api/uploadthing/route.ts#POST': {
    kind: 'delegated',
    allowed: ['inspector'],
    why: "uploadthing's handler: POST asks to upload (admitted by survey.photo.authorize) or carries the upload service's signed callback",
    operation: async () => (await import('@/lib/survey/server/survey-photo-access')).authorizeSurveyPhoto,
    input: async (c) => ({ inspectionId: await newInspection(c.fx.accounts.seller.id, 'on_site', inspectorOf(c).id), section: 'identity' }),
  },
};

// ── discovery ───────────────────────────────────────────────────────────────────────────────────

const ROOT = path.resolve(import.meta.dirname, '../..');
const HTTP_METHODS = new Set(['GET', 'HEAD', 'POST', 'PUT', 'PATCH', 'DELETE', 'OPTIONS']);

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? filesUnder(full) : /\.(ts|tsx)$/.test(name) ? [full] : [];
  });
}

/** Names a module exports, read from its source. Checked against the real module below. */
function exportedNames(source: string) {
  const names = new Set<string>();
  for (const match of source.matchAll(/export\s+(?:async\s+)?function\s+(\w+)/g)) names.add(match[1]!);
  for (const match of source.matchAll(/export\s+const\s+(\w+)\s*=/g)) names.add(match[1]!);
  for (const match of source.matchAll(/export\s+const\s*\{([^}]+)\}\s*=/g)) for (const name of match[1]!.split(',')) names.add(name.trim().split(':').pop()!.trim());
  return [...names];
}

const STARTS_WITH_USE_SERVER = /^(?:\s|\/\/[^\n]*\n|\/\*[\s\S]*?\*\/)*['"]use server['"]/;

type Endpoint = { key: string; file: string; name: string; type: 'route' | 'action' | 'inline' };

function discoverEndpoints(): Endpoint[] {
  const endpoints: Endpoint[] = [];
  for (const file of filesUnder(path.join(ROOT, 'app'))) {
    const relative = path.relative(ROOT, file).split(path.sep).join('/');
    const source = readFileSync(file, 'utf8');
    if (/\/route\.tsx?$/.test(relative)) {
      for (const name of exportedNames(source).filter((n) => HTTP_METHODS.has(n))) endpoints.push({ key: `${relative}#${name}`, file, name, type: 'route' });
    } else if (STARTS_WITH_USE_SERVER.test(source)) {
      for (const name of exportedNames(source)) endpoints.push({ key: `${relative}#${name}`, file, name, type: 'action' });
    } else if (/['"]use server['"]/.test(source)) {
      endpoints.push({ key: `${relative}#inline`, file, name: 'inline', type: 'inline' });
    }
  }
  return endpoints.sort((a, b) => a.key.localeCompare(b.key));
}

const ENDPOINTS = discoverEndpoints();

// ── calling and judging ─────────────────────────────────────────────────────────────────────────

type Verdict = 'allowed' | 'refused';

async function deniedAuditCount(actor: Actor | null) {
  if (!actor) return 0;
  const [row] = await db.select({ n: count() }).from(auditEvents).where(and(eq(auditEvents.actorId, actor.id), eq(auditEvents.outcome, 'denied'), gt(auditEvents.createdAt, new Date(Date.now() - 60_000))));
  return row?.n ?? 0;
}

/** Runs one call as `actor` and decides whether authorisation let it through. */
async function judge(actor: Actor | null, call: () => Promise<{ status?: number; code?: string; ok?: boolean; message?: string }>): Promise<Verdict> {
  session.actor = actor;
  session.ip = someIp();
  const before = await deniedAuditCount(actor);
  let outcome: { status?: number; code?: string; ok?: boolean; message?: string };
  try {
    outcome = await call();
  } catch (error) {
    // redirect() from an action (e.g. on to checkout) means the action went through.
    if (String((error as { digest?: unknown })?.digest ?? '').startsWith('NEXT_REDIRECT')) return 'allowed';
    throw error;
  }
  // Form-state actions pass on only the message: map the wrapper's refusal messages back to codes.
  const fromMessage = (['unauthenticated', 'forbidden'] as const).find((c) => outcome.message === ERROR_CODES[c].message);
  const code =
    outcome.code ?? fromMessage ?? (outcome.status === 401 ? 'unauthenticated' : outcome.status === 403 ? 'forbidden' : outcome.status === 404 ? 'not_found' : undefined);
  if (code === 'unauthenticated' || code === 'forbidden') return 'refused';
  // Ownership refusals (and role refusals of form-state actions) leave a "denied" audit event.
  if ((code === 'not_found' || code === undefined) && (await deniedAuditCount(actor)) > before) return 'refused';
  return 'allowed';
}

function formDataOf(input: unknown) {
  const form = new FormData();
  for (const [key, value] of Object.entries(input as Record<string, unknown>)) form.set(key, String(value));
  return form;
}

async function callAction(endpoint: Endpoint, input: unknown, form = false) {
  const loaded = (await import(/* @vite-ignore */ endpoint.file)) as Record<string, (...args: unknown[]) => Promise<{ ok?: boolean; code?: string; message?: string }>>;
  return form ? loaded[endpoint.name]!({}, formDataOf(input)) : loaded[endpoint.name]!(input);
}

async function callRoute(endpoint: Endpoint, call: HttpCall) {
  const loaded = (await import(/* @vite-ignore */ endpoint.file)) as Record<string, (request: NextRequest, context: { params: Promise<Record<string, string>> }) => Promise<Response>>;
  const init = call.body === undefined ? { method: call.method ?? 'GET' } : { method: call.method ?? 'POST', body: JSON.stringify(call.body), headers: { 'content-type': 'application/json' } };
  const response = await loaded[endpoint.name]!(new NextRequest(new URL(call.url, 'http://localhost:3000'), init), { params: Promise.resolve(call.params) });
  const body = (await response.json().catch(() => ({}))) as { code?: string };
  return { status: response.status, code: body.code };
}

function subjectActor(subject: Subject) {
  return subject === 'signed-out' ? null : fx.accounts[subject];
}

// ── the tests ───────────────────────────────────────────────────────────────────────────────────

describe('the authorisation matrix', () => {
  beforeAll(async () => {
    const entries = await Promise.all(ROLES.map(async (role) => [role, await createAccount(role)] as const));
    fx = {
      accounts: Object.fromEntries(entries) as Record<Role, TestAccount>,
      otherSeller: await createAccount('seller'),
      otherInspector: await createAccount('inspector'),
      otherDealer: await createAccount('dealer'),
    };
  });
  afterAll(closeDatabase);

  it('finds the app’s route handlers and server actions', () => {
    expect(ENDPOINTS.some((e) => e.type === 'route')).toBe(true);
    expect(ENDPOINTS.some((e) => e.type === 'action')).toBe(true);
  });

  for (const endpoint of ENDPOINTS) {
    it(`has a rule for ${endpoint.key}`, () => {
      expect(RULES[endpoint.key], `add a rule for ${endpoint.key} to RULES in this file`).toBeDefined();
    });
  }

  for (const key of Object.keys(RULES)) {
    it(`matches the rule for ${key} to something the app still has`, () => {
      expect(ENDPOINTS.map((e) => e.key)).toContain(key);
    });
  }

  it('reads each module’s exports as the module itself exports them', async () => {
    for (const file of new Set(ENDPOINTS.filter((e) => e.type !== 'inline').map((e) => e.file))) {
      const loaded = (await import(/* @vite-ignore */ file)) as Record<string, unknown>;
      const relative = path.relative(ROOT, file).split(path.sep).join('/');
      const real = Object.keys(loaded).filter((name) => typeof loaded[name] === 'function' && (!/\/route\.tsx?$/.test(relative) || HTTP_METHODS.has(name)));
      const found = ENDPOINTS.filter((e) => e.file === file).map((e) => e.name);
      expect(found.sort(), relative).toEqual(real.sort());
    }
  });

  for (const endpoint of ENDPOINTS) {
    const rule = RULES[endpoint.key];
    if (!rule || rule.kind === 'auth-library' || rule.kind === 'inline') continue;
    if (rule.kind === 'signed') {
      describe(endpoint.key, () => {
        for (const subject of SUBJECTS) {
          it(`refuses an unsigned request ${subject === 'signed-out' ? 'signed out' : `from a ${subject}`}`, async () => {
            const actor = subjectActor(subject);
            session.actor = actor?.actor ?? null;
            const response = await callRoute(endpoint, await rule.request({ actor, fx }));
            expect(response.status).toBe(400);
          });
        }
      });
      continue;
    }
    describe(endpoint.key, () => {
      for (const subject of SUBJECTS) {
        const expected: Verdict = rule.allowed.includes(subject) ? 'allowed' : 'refused';
        it(`${expected === 'allowed' ? 'lets' : 'refuses'} ${subject === 'signed-out' ? 'a signed-out visitor' : `a ${subject}`}`, async () => {
          const actor = subjectActor(subject);
          const c: Context = { actor, fx };
          const verdict =
            rule.kind === 'action'
              ? await judge(actor?.actor ?? null, async () => callAction(endpoint, await rule.input(c), rule.form))
              : rule.kind === 'route'
                ? await judge(actor?.actor ?? null, async () => callRoute(endpoint, await rule.request(c)))
                : await judge(actor?.actor ?? null, async () => (await rule.operation()).execute(actor?.actor ?? null, await rule.input(c)));
          expect(verdict).toBe(expected);
        });
      }
      const others = 'others' in rule ? rule.others : undefined;
      if (others) {
        for (const subject of SUBJECTS.filter((s) => rule.allowed.includes(s))) {
          const expected: Verdict = others.allowed.includes(subject) ? 'allowed' : 'refused';
          it(`${expected === 'allowed' ? 'lets' : 'refuses'} a ${subject} acting on someone else’s record`, async () => {
            const actor = subjectActor(subject);
            const c: Context = { actor, fx };
            const verdict =
              rule.kind === 'action' && 'input' in others
                ? await judge(actor?.actor ?? null, async () => callAction(endpoint, await others.input(c), rule.form))
                : await judge(actor?.actor ?? null, async () => callRoute(endpoint, await (others as { request: (c: Context) => Promise<HttpCall> }).request(c)));
            expect(verdict).toBe(expected);
          });
        }
      }
    });
  }

  it('keeps every rule file path real', () => {
    for (const key of Object.keys(RULES)) expect(existsSync(path.join(ROOT, key.split('#')[0]!)), key).toBe(true);
  });
});
