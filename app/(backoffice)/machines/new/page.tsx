import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { requirePageSession } from '@/lib/auth/session';
import { can } from '@/lib/roles';
import { MachineForm } from '../machine-form';

export const metadata: Metadata = { title: 'Add a machine' };

export default async function NewMachinePage() {
  const user = await requirePageSession();
  if (!can(user.role, 'machine.edit.own')) notFound();
  return (
    <div className="max-w-3xl">
      <h1 className="text-3xl font-semibold">Add a machine</h1>
      <p className="mb-8 mt-1 text-ink-soft">Take the figures from the nameplate where you can. You can change them until the inspection.</p>
      <MachineForm />
    </div>
  );
}
