import 'server-only';
import { and, asc, count, desc, eq, isNotNull, isNull, like, or, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import { db } from '@/db/client';
import { users, workshops } from '@/db/schema';
import type { PeopleFilters } from '@/lib/validation/list-filters';
import { containsPattern } from './like-pattern';

export const PEOPLE_PAGE_SIZE = 25;

// Only these columns can be sorted on: the URL names one, this table maps it.
const SORT_COLUMNS = { name: users.name, email: users.email, role: users.role, created: users.createdAt } as const;

const STATE_CONDITIONS = {
  active: () => and(isNull(users.deactivatedAt), isNotNull(users.emailVerified)),
  unconfirmed: () => and(isNull(users.deactivatedAt), isNull(users.emailVerified)),
  deactivated: () => isNotNull(users.deactivatedAt),
} as const;

function peopleWhere(filters: PeopleFilters): SQL | undefined {
  const conditions: SQL[] = [];
  if (filters.q) {
    const pattern = containsPattern(filters.q);
    conditions.push(or(like(users.name, pattern), like(users.email, pattern), like(workshops.name, pattern))!);
  }
  if (filters.role) conditions.push(eq(users.role, filters.role));
  if (filters.state) conditions.push(STATE_CONDITIONS[filters.state]()!);
  return conditions.length ? and(...conditions) : undefined;
}

/** One page of accounts for the people list, with the total for paging. */
export async function listPeople(filters: PeopleFilters) {
  const where = peopleWhere(filters);
  const order = filters.dir === 'asc' ? asc(SORT_COLUMNS[filters.sort]) : desc(SORT_COLUMNS[filters.sort]);
  const [rows, [total]] = await Promise.all([
    db
      .select({
        id: users.id,
        name: users.name,
        email: users.email,
        role: users.role,
        business: workshops.name,
        emailVerified: users.emailVerified,
        deactivatedAt: users.deactivatedAt,
        hasPassword: isNotNull(users.passwordHash),
        createdAt: users.createdAt,
      })
      .from(users)
      .leftJoin(workshops, eq(workshops.id, users.workshopId))
      .where(where)
      .orderBy(order, asc(users.id))
      .limit(PEOPLE_PAGE_SIZE)
      .offset((filters.page - 1) * PEOPLE_PAGE_SIZE),
    db.select({ total: count() }).from(users).leftJoin(workshops, eq(workshops.id, users.workshopId)).where(where),
  ]);
  return { rows: rows.map((row) => ({ ...row, hasPassword: Boolean(row.hasPassword) })), total: total?.total ?? 0 };
}

const inviter = alias(users, 'inviter');

/** One account for its page in the admin area, or null. */
export async function findPerson(id: string) {
  const [row] = await db
    .select({
      id: users.id,
      name: users.name,
      email: users.email,
      role: users.role,
      phone: users.phone,
      business: workshops.name,
      town: workshops.town,
      emailVerified: users.emailVerified,
      deactivatedAt: users.deactivatedAt,
      hasPassword: isNotNull(users.passwordHash),
      createdAt: users.createdAt,
      invitedBy: inviter.name,
    })
    .from(users)
    .leftJoin(workshops, eq(workshops.id, users.workshopId))
    .leftJoin(inviter, eq(inviter.id, users.invitedById))
    .where(eq(users.id, id))
    .limit(1);
  return row ? { ...row, hasPassword: Boolean(row.hasPassword) } : null;
}

export type PersonRow = Awaited<ReturnType<typeof listPeople>>['rows'][number];
