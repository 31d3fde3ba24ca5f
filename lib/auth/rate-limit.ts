import 'server-only';
import { inArray, sql } from 'drizzle-orm';
import { db, primaryOf } from '@/db/client';
import { rateLimitBuckets } from '@/db/schema';

/**
 * Attempt limits, counted in the database so every app server sees the same numbers. Per address,
 * reaching the limit inside the window blocks the address for one more window, whatever the next
 * attempt carries. Per address the limits are wider than per account: a workshop's staff often share
 * one address.
 *
 * Per account nothing blocks, because anyone can send attempts for any account:
 * - `sign-in:account` slows down (`slowDown`): from the limit on, each further wrong password makes the
 *   account wait a growing delay (2, 4, 8 … s, at most `maxDelayMs`) before the next attempt is judged;
 *   attempts inside the delay are refused without being counted, so hammering does not lengthen it.
 *   A device the account signed in from before (`known-device.ts`) skips the delay altogether.
 * - `reset:account` only limits mail (`mailBudget`): past the limit the same answer is given, no new
 *   link is made and no mail sent, so the last link mailed keeps working (it lives 60 minutes, longer
 *   than the window).
 */
export const RATE_LIMITS = {
  'sign-in:account': { limit: 10, windowMs: 15 * 60_000, slowDown: { maxDelayMs: 60_000 } },
  'sign-in:ip': { limit: 50, windowMs: 60_000 },
  'reset:account': { limit: 5, windowMs: 15 * 60_000, mailBudget: true },
  'reset:ip': { limit: 20, windowMs: 15 * 60_000 },
  // Every sign-up sends a mail: these keep the form from being used to flood an inbox or create
  // accounts in bulk (our own common practice, no published source).
  'sign-up:account': { limit: 5, windowMs: 15 * 60_000 },
  'sign-up:ip': { limit: 20, windowMs: 60 * 60_000 },
} as const satisfies Record<string, { limit: number; windowMs: number; slowDown?: { maxDelayMs: number }; mailBudget?: true }>;

/** The wait after the `hits`-th wrong password inside the window (hits ≥ limit), in milliseconds. */
export function slowDownDelayMs(hits: number, limit: number, maxDelayMs: number) {
  return Math.min(2 ** (hits - limit + 1) * 1_000, maxDelayMs);
}

export type RateLimitName = keyof typeof RATE_LIMITS;
export type RateLimitSubject = { name: RateLimitName; key: string };

/** The subjects for one person at one address; the address is left out when it is unknown. */
export function subjectsFor(kind: 'sign-in' | 'reset' | 'sign-up', account: string, ip: string | null): RateLimitSubject[] {
  const subjects: RateLimitSubject[] = [{ name: `${kind}:account`, key: account.trim().toLowerCase() }];
  if (ip) subjects.push({ name: `${kind}:ip`, key: ip });
  return subjects;
}

function bucketKey(subject: RateLimitSubject) {
  return `${subject.name}:${subject.key}`.slice(0, 200);
}

/** The names of the subjects that are blocked (or being slowed down) at `now`. */
export async function limitedSubjects(subjects: RateLimitSubject[], now = new Date()): Promise<Set<RateLimitName>> {
  if (subjects.length === 0) return new Set();
  // The primary: attempts are counted there a moment ago, and a lagging replica would let a burst through.
  const rows = await primaryOf(db)
    .select({ bucketKey: rateLimitBuckets.bucketKey, blockedUntil: rateLimitBuckets.blockedUntil })
    .from(rateLimitBuckets)
    .where(inArray(rateLimitBuckets.bucketKey, subjects.map(bucketKey)));
  const limited = new Set(rows.filter((row) => row.blockedUntil !== null && row.blockedUntil > now).map((row) => row.bucketKey));
  return new Set(subjects.filter((subject) => limited.has(bucketKey(subject))).map((subject) => subject.name));
}

/** True when any of the subjects is blocked (or being slowed down) at `now`. */
export async function isRateLimited(subjects: RateLimitSubject[], now = new Date()): Promise<boolean> {
  return (await limitedSubjects(subjects, now)).size > 0;
}

/**
 * Counts one attempt against each subject with one atomic upsert per bucket, so attempts arriving at
 * several app servers at once are all counted. MariaDB applies ON DUPLICATE KEY UPDATE assignments
 * left to right (columns in table order: hits, window_started_at, blocked_until), so blocked_until
 * already sees the new hit count.
 */
export async function recordAttempt(subjects: RateLimitSubject[], now = new Date()) {
  for (const subject of subjects) {
    const rule: { limit: number; windowMs: number; slowDown?: { maxDelayMs: number } } = RATE_LIMITS[subject.name];
    const { limit, windowMs } = rule;
    const windowCutoff = new Date(now.getTime() - windowMs);
    // A block lasts one window; a slow-down lasts its growing delay, counted from this attempt.
    const until = rule.slowDown
      ? sql`TIMESTAMPADD(MICROSECOND, CAST(LEAST(POW(2, ${rateLimitBuckets.hits} - ${limit - 1}) * 1000, ${rule.slowDown.maxDelayMs}) * 1000 AS SIGNED), ${now})`
      : sql`${new Date(now.getTime() + windowMs)}`;
    const firstUntil = limit <= 1 ? (rule.slowDown ? new Date(now.getTime() + slowDownDelayMs(1, limit, rule.slowDown.maxDelayMs)) : new Date(now.getTime() + windowMs)) : null;
    await db
      .insert(rateLimitBuckets)
      .values({ bucketKey: bucketKey(subject), hits: 1, windowStartedAt: now, blockedUntil: firstUntil })
      .onDuplicateKeyUpdate({
        set: {
          hits: sql`IF(${rateLimitBuckets.windowStartedAt} <= ${windowCutoff}, 1, ${rateLimitBuckets.hits} + 1)`,
          windowStartedAt: sql`IF(${rateLimitBuckets.windowStartedAt} <= ${windowCutoff}, ${now}, ${rateLimitBuckets.windowStartedAt})`,
          blockedUntil: sql`IF(${rateLimitBuckets.hits} >= ${limit}, ${until}, ${rateLimitBuckets.blockedUntil})`,
        },
      });
  }
}

/** Forgets the counts, e.g. for an account after a successful sign-in or a password reset. */
export async function clearAttempts(subjects: RateLimitSubject[]) {
  if (subjects.length === 0) return;
  await db.delete(rateLimitBuckets).where(inArray(rateLimitBuckets.bucketKey, subjects.map(bucketKey)));
}

/**
 * For a request that mails a link (reset, confirmation): `refused` when the address is over its
 * limit; `quiet` when the account's mail budget is spent (answer as usual, but make no new link and
 * send nothing, so the last link mailed keeps working); else `mail`. Refused and quiet requests are
 * not counted against the account, so its budget frees one window after the last mail.
 */
export async function admitLinkRequest(account: string, ip: string | null, now = new Date()): Promise<'refused' | 'quiet' | 'mail'> {
  const subjects = subjectsFor('reset', account, ip);
  const limited = await limitedSubjects(subjects, now);
  if (limited.has('reset:ip')) return 'refused';
  const quiet = limited.has('reset:account');
  await recordAttempt(quiet ? subjects.filter((subject) => subject.name !== 'reset:account') : subjects, now);
  return quiet ? 'quiet' : 'mail';
}
