import type { Metadata } from 'next';
import { requirePageSession } from '@/lib/auth/session';
import { ROLE_LABELS } from '@/lib/roles';
import { SellerOverview } from './seller-overview';
import { InspectorOverview } from './inspector-overview';
import { BuyerOverview } from './buyer-overview';
import { CoordinatorOverview } from './coordinator-overview';

export const metadata: Metadata = { title: 'Overview' };

const OVERVIEWS = {
  seller: SellerOverview,
  inspector: InspectorOverview,
  buyer: BuyerOverview,
  dealer: BuyerOverview,
  admin: CoordinatorOverview,
} as const;

export default async function DashboardPage() {
  const user = await requirePageSession();
  const Overview = OVERVIEWS[user.role];
  return (
    <>
      <p className="text-sm font-semibold uppercase tracking-widest text-copper">{ROLE_LABELS[user.role]}</p>
      <h1 className="mt-1 text-3xl font-semibold">Good to see you, {user.name?.split(' ')[0] ?? 'there'}</h1>
      <div className="mt-8">
        <Overview userId={user.id} />
      </div>
    </>
  );
}
