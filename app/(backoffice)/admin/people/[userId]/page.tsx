import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { listAuditEventsAboutUser } from '@/db/queries/audit';
import { findPerson } from '@/db/queries/users';
import { accountState } from '@/lib/accounts/account-state';
import { requirePagePermission } from '@/lib/auth/session';
import { formatDate, formatDateTime } from '@/lib/format';
import { ROLE_LABELS } from '@/lib/roles';
import { AccountStateBadge } from '../account-state-badge';
import { AccountStatusForm } from './account-status-form';
import { RoleForm } from './role-form';

export const metadata: Metadata = { title: 'Person' };

export default async function PersonPage({ params }: { params: Promise<{ userId: string }> }) {
  const viewer = await requirePagePermission('users.manage');
  const { userId } = await params;
  if (!z.uuid().safeParse(userId).success) notFound();
  const person = await findPerson(userId);
  if (!person) notFound();
  const events = await listAuditEventsAboutUser(person.id);
  const state = accountState(person);
  const self = viewer.id === person.id;

  const facts: Array<[string, string]> = [
    ['E-mail', person.email],
    ['Role', ROLE_LABELS[person.role]],
    ['Business', person.business ? `${person.business}${person.town ? `, ${person.town}` : ''}` : '—'],
    ['Joined', formatDate(person.createdAt)],
    ['Address confirmed', person.emailVerified ? formatDate(person.emailVerified) : 'not yet'],
  ];
  if (person.invitedBy) facts.push(['Invited by', person.invitedBy]);
  if (person.deactivatedAt) facts.push(['Deactivated', formatDateTime(person.deactivatedAt)]);

  return (
    <>
      <Link href="/admin/people" className="inline-flex min-h-touch items-center text-ink-soft hover:text-ink">
        ← People
      </Link>
      <div className="mt-2 flex flex-wrap items-center gap-3">
        <h1 className="text-3xl font-semibold">{person.name ?? person.email}</h1>
        <AccountStateBadge state={state} />
      </div>
      <div className="mt-6 grid gap-6 lg:grid-cols-[3fr_2fr]">
        <Card title="Account">
          <dl className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-2">
            {facts.map(([label, value]) => (
              <div key={label} className="contents">
                <dt className="text-ink-soft">{label}</dt>
                <dd className="break-all font-medium">{value}</dd>
              </div>
            ))}
          </dl>
        </Card>
        <div className="space-y-6">
          {self ? (
            <Card title="Your own account">
              <p className="text-ink-soft">Coordinators cannot change their own role or deactivate themselves. Ask another coordinator.</p>
            </Card>
          ) : (
            <>
              <Card title="Role">
                <RoleForm userId={person.id} role={person.role} />
              </Card>
              <Card title={person.deactivatedAt ? 'Deactivated' : 'Access'}>
                <AccountStatusForm userId={person.id} active={!person.deactivatedAt} name={person.name ?? person.email} />
              </Card>
            </>
          )}
        </div>
      </div>
      <section className="mt-8">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 className="text-xl font-semibold">Recent activity</h2>
          <Link href={`/admin/audit?actor=${person.id}`} className="inline-flex min-h-touch items-center font-medium text-copper-dark underline-offset-4 hover:underline">
            Everything this person did
          </Link>
        </div>
        {events.length === 0 ? (
          <div className="mt-3">
            <EmptyState title="Nothing recorded yet" text="Sign-ins and changes to this account will appear here." />
          </div>
        ) : (
          <ol className="mt-3 divide-y divide-line rounded-card border border-line bg-paper-raised">
            {events.map((event) => (
              <li key={event.id} className="flex flex-wrap gap-x-4 gap-y-1 px-4 py-2">
                <span className="figures w-44 shrink-0 text-sm text-ink-soft">{formatDateTime(event.createdAt)}</span>
                <span className="font-medium">{event.action}</span>
                <span className="text-ink-soft">{event.outcome === 'ok' ? '' : event.outcome}</span>
                <span className="text-sm text-ink-soft">{event.actorName ? `by ${event.actorName}` : ''}</span>
              </li>
            ))}
          </ol>
        )}
      </section>
    </>
  );
}
