import 'server-only';
import { inArray, sql } from 'drizzle-orm';
import { db, primaryOf } from '@/db/client';
import { rateLimitBuckets } from '@/db/schema';

/**
 * Attempt limits, counted in the database so every app server sees the same numbers. Reaching the
 * limit inside the window blocks the key for one more window, whatever the next attempt carries.
 * Per address the limits are wider than per account: a workshop's staff often share one address.
 */
export const RATE_LIMITS = {
  'sign-in:account': { limit: 10, windowMs: 60_000 },
  'sign-in:ip': { limit: 50, windowMs: 60_000 },
  'reset:account': { limit: 5, windowMs: 15 * 60_000 },
  'reset:ip': { limit: 20, windowMs: 15 * 60_000 },
  // Every sign-up sends a mail: these keep the form from being used to flood an inbox or create
  // accounts in bulk (our own common practice, no published source).
  'sign-up:account': { limit: 5, windowMs: 15 * 60_000 },
  'sign-up:ip': { limit: 20, windowMs: 60 * 60_000 },
} as const;

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

/** True when any of the subjects is blocked at `now`. */
export async function isRateLimited(subjects: RateLimitSubject[], now = new Date()): Promise<boolean> {
  if (subjects.length === 0) return false;
  // The primary: attempts are counted there a moment ago, and a lagging replica would let a burst through.
  const rows = await primaryOf(db)
    .select({ blockedUntil: rateLimitBuckets.blockedUntil })
    .from(rateLimitBuckets)
    .where(inArray(rateLimitBuckets.bucketKey, subjects.map(bucketKey)));
  return rows.some((row) => row.blockedUntil !== null && row.blockedUntil > now);
}

/**
 * Counts one attempt against each subject with one atomic upsert per bucket, so attempts arriving at
 * several app servers at once are all counted. MariaDB applies ON DUPLICATE KEY UPDATE assignments
 * left to right (columns in table order: hits, window_started_at, blocked_until), so blocked_until
 * already sees the new hit count.
 */
export async function recordAttempt(subjects: RateLimitSubject[], now = new Date()) {
  for (const subject of subjects) {
    const { limit, windowMs } = RATE_LIMITS[subject.name];
    const windowCutoff = new Date(now.getTime() - windowMs);
    const blockedUntil = new Date(now.getTime() + windowMs);
    await db
      .insert(rateLimitBuckets)
      .values({ bucketKey: bucketKey(subject), hits: 1, windowStartedAt: now, blockedUntil: limit <= 1 ? blockedUntil : null })
      .onDuplicateKeyUpdate({
        set: {
          hits: sql`IF(${rateLimitBuckets.windowStartedAt} <= ${windowCutoff}, 1, ${rateLimitBuckets.hits} + 1)`,
          windowStartedAt: sql`IF(${rateLimitBuckets.windowStartedAt} <= ${windowCutoff}, ${now}, ${rateLimitBuckets.windowStartedAt})`,
          blockedUntil: sql`IF(${rateLimitBuckets.hits} >= ${limit}, ${blockedUntil}, ${rateLimitBuckets.blockedUntil})`,
        },
      });
  }
}

/** Forgets the counts, e.g. for an account after a successful sign-in or a password reset. */
export async function clearAttempts(subjects: RateLimitSubject[]) {
  if (subjects.length === 0) return;
  await db.delete(rateLimitBuckets).where(inArray(rateLimitBuckets.bucketKey, subjects.map(bucketKey)));
}
