import { index, int, mysqlEnum, mysqlTable, primaryKey, text, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, timestamp, updatedAt, userId } from './columns';
import { workshops } from './workshops';

export const ROLES = ['seller', 'inspector', 'buyer', 'dealer', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/** People who sign in. Column names id/name/email/emailVerified/image are what Auth.js expects. */
export const users = mysqlTable(
  'users',
  {
    id: varchar('id', { length: 36 }).primaryKey(),
    name: varchar('name', { length: 120 }),
    email: varchar('email', { length: 254 }).notNull(),
    emailVerified: timestamp('email_verified'),
    image: varchar('image', { length: 500 }),
    role: mysqlEnum('role', ROLES).notNull(),
    passwordHash: varchar('password_hash', { length: 100 }),
    workshopId: int('workshop_id').references(() => workshops.id),
    phone: varchar('phone', { length: 40 }),
    // Bumped on password change and deactivation; a session token carrying an older value is refused.
    sessionVersion: int('session_version').notNull().default(0),
    deactivatedAt: timestamp('deactivated_at'),
    invitedById: userId('invited_by_id'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('users_email_uq').on(t.email), index('users_role_idx').on(t.role)],
);

/** Auth.js adapter tables, kept for OAuth providers and database sessions should they be added. */
export const accounts = mysqlTable(
  'accounts',
  {
    userId: userId('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    type: varchar('type', { length: 255 }).notNull(),
    provider: varchar('provider', { length: 255 }).notNull(),
    providerAccountId: varchar('provider_account_id', { length: 255 }).notNull(),
    refresh_token: text('refresh_token'),
    access_token: text('access_token'),
    expires_at: int('expires_at'),
    token_type: varchar('token_type', { length: 255 }),
    scope: varchar('scope', { length: 255 }),
    id_token: text('id_token'),
    session_state: varchar('session_state', { length: 255 }),
  },
  (t) => [primaryKey({ columns: [t.provider, t.providerAccountId] })],
);

export const sessions = mysqlTable('sessions', {
  sessionToken: varchar('session_token', { length: 255 }).primaryKey(),
  userId: userId('user_id')
    .notNull()
    .references(() => users.id, { onDelete: 'cascade' }),
  expires: timestamp('expires').notNull(),
});

export const verificationTokens = mysqlTable(
  'verification_tokens',
  {
    identifier: varchar('identifier', { length: 255 }).notNull(),
    token: varchar('token', { length: 255 }).notNull(),
    expires: timestamp('expires').notNull(),
  },
  (t) => [primaryKey({ columns: [t.identifier, t.token] })],
);

export const USER_TOKEN_PURPOSES = ['verify_email', 'reset_password', 'invitation'] as const;

/** One-time links sent by e-mail; only a SHA-256 of the token is stored. */
export const userTokens = mysqlTable(
  'user_tokens',
  {
    id: int('id').autoincrement().primaryKey(),
    userId: userId('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    purpose: mysqlEnum('purpose', USER_TOKEN_PURPOSES).notNull(),
    tokenHash: varchar('token_hash', { length: 64 }).notNull(),
    expiresAt: timestamp('expires_at').notNull(),
    usedAt: timestamp('used_at'),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('user_tokens_hash_uq').on(t.tokenHash), index('user_tokens_user_idx').on(t.userId, t.purpose)],
);

/** Attempt counters for sign-in and reset, shared by every app server through the database. */
export const rateLimitBuckets = mysqlTable('rate_limit_buckets', {
  bucketKey: varchar('bucket_key', { length: 200 }).primaryKey(),
  hits: int('hits').notNull().default(0),
  windowStartedAt: timestamp('window_started_at').notNull(),
  blockedUntil: timestamp('blocked_until'),
});
