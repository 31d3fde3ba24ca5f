import type { Metadata } from 'next';
import { Card } from '@/components/ui/card';
import { requirePageSession } from '@/lib/auth/session';
import { findShopSupply } from '@/db/queries/shop-supply';
import { can, ROLE_LABELS } from '@/lib/roles';
import { ChangePasswordForm } from './change-password-form';
import { ShopSupplyForm } from './shop-supply-form';

export const metadata: Metadata = { title: 'Your account' };

export default async function AccountPage() {
  const user = await requirePageSession();
  const buys = can(user.role, 'report.buy');
  const supply = buys ? await findShopSupply(user.id) : null;
  return (
    <div className="max-w-lg">
      <h1 className="text-3xl font-semibold">Your account</h1>
      <p className="mt-1 text-ink-soft">
        {user.name ?? user.email} · {ROLE_LABELS[user.role]} · {user.email}
      </p>
      {buys ? (
        <Card title="Your shop’s power supply" className="mt-6">
          <p className="mb-4 text-ink-soft">Reports use it to say whether a machine runs in your shop or needs a phase converter, and what that typically costs.</p>
          <ShopSupplyForm defaults={supply ? { supplyVoltage: supply.voltage, supplyPhases: supply.phases } : {}} />
        </Card>
      ) : null}
      <Card title="Change your password" className="mt-6">
        <p className="mb-4 text-ink-soft">Changing it signs you out everywhere, including here; sign in again with the new one.</p>
        <ChangePasswordForm email={user.email ?? null} />
      </Card>
    </div>
  );
}
