// Demo data: the invented Brenmark valley marketplace. `--if-empty` leaves a used database alone.
import { randomUUID } from 'node:crypto';
import { count } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import {
  inspectionFees,
  inspections,
  inspectionStatusEvents,
  machines,
  users,
  workshops,
  type InspectionStatus,
} from '@/db/schema';
import { hashPassword } from '@/lib/auth/password';
import { sizeClassForSwing } from '@/lib/machine-size';
import { DEMO_LOGINS } from './demo-logins.mjs';
import { seededRandom } from './random';
import { ACCESSORY_SETS, CANCEL_REASONS, FEES, LATHE_MODELS, SITE_NOTES, WORKSHOPS } from './scenario';

const DAY = 24 * 60 * 60 * 1000;

/** How far along each of the 40 demo machines is; every inspection status is represented. */
const MACHINE_PLAN: ReadonlyArray<{ status: InspectionStatus | 'none'; count: number }> = [
  { status: 'none', count: 5 },
  { status: 'requested', count: 5 },
  { status: 'booked', count: 5 },
  { status: 'on_site', count: 3 },
  { status: 'in_review', count: 4 },
  { status: 'released', count: 15 },
  { status: 'cancelled', count: 3 },
];

const STATUS_PATH: InspectionStatus[] = ['requested', 'booked', 'on_site', 'in_review', 'released'];

export async function seedDemo(now = new Date()) {
  const random = seededRandom(20261202);
  const passwordHash = await hashPassword(DEMO_LOGINS.password);

  const workshopIds: number[] = [];
  for (const workshop of WORKSHOPS) {
    const [row] = await db.insert(workshops).values(workshop).$returningId();
    workshopIds.push(row!.id);
  }

  const accounts = DEMO_LOGINS.accounts.map((account) => ({
    id: randomUUID(),
    name: account.name,
    email: account.email,
    role: account.role,
    passwordHash,
    emailVerified: new Date(now.getTime() - 90 * DAY),
    workshopId: account.workshop === undefined ? workshopIds[11]! : workshopIds[account.workshop]!,
  }));
  await db.insert(users).values(accounts);
  const byRole = (role: string) => accounts.filter((a) => a.role === role);
  const sellers = byRole('seller');
  const inspectors = byRole('inspector');
  const coordinator = byRole('admin')[0]!;

  for (const fee of FEES) {
    await db.insert(inspectionFees).values({ machineType: 'centre_lathe', ...fee, updatedById: coordinator.id });
  }

  let machineIndex = 0;
  const created: Array<{ machineId: number; inspectionId: number | null; status: InspectionStatus | 'none' }> = [];
  for (const plan of MACHINE_PLAN) {
    for (let i = 0; i < plan.count; i += 1, machineIndex += 1) {
      const seller = sellers[machineIndex % sellers.length]!;
      const sellerAccount = DEMO_LOGINS.accounts.find((a) => a.email === seller.email)!;
      const workshop = WORKSHOPS[sellerAccount.workshop!]!;
      const model = LATHE_MODELS[machineIndex % LATHE_MODELS.length]!;
      const yearBuilt = random.int(1978, 2019);
      const ageYears = now.getUTCFullYear() - yearBuilt;
      const basePrice = model.swingMm * 60 * (model.kind === 'toolroom' ? 1.8 : 1);
      const askingPrice = Math.round((basePrice * Math.max(0.25, 1 - ageYears / 60)) / 50) * 50;
      const [machine] = await db
        .insert(machines)
        .values({
          sellerId: seller.id,
          workshopId: workshopIds[sellerAccount.workshop!]!,
          latheKind: model.kind,
          maker: model.maker,
          model: model.model,
          serialNumber: `${model.maker.slice(0, 2).toUpperCase()}${random.int(10000, 99999)}`,
          yearBuilt,
          swingMm: model.swingMm,
          betweenCentresMm: random.pick(model.centres),
          spindleBoreMm: model.boreMm,
          motorKw: model.motorKw.toFixed(2),
          supplyVoltage: model.phases === 1 ? 230 : 400,
          supplyPhases: model.phases,
          sizeClass: sizeClassForSwing(model.swingMm),
          town: workshop.town,
          region: workshop.region,
          askingPriceMinor: askingPrice * 100,
          accessories: random.pick(ACCESSORY_SETS),
          description: `${model.maker} ${model.model} from ${workshop.name}, in regular use until recently.`,
          listingStatus: plan.status === 'none' && i === 0 ? 'draft' : 'listed',
        })
        .$returningId();
      const machineId = machine!.id;
      if (plan.status === 'none') {
        created.push({ machineId, inspectionId: null, status: 'none' });
        continue;
      }

      const requestedAt = new Date(now.getTime() - random.int(20, 120) * DAY);
      const reachesIndex = plan.status === 'cancelled' ? random.int(0, 1) : STATUS_PATH.indexOf(plan.status);
      const booked = reachesIndex >= 1;
      const inspector = inspectors[machineIndex % inspectors.length]!;
      const scheduledAt = booked
        ? new Date(plan.status === 'booked' ? now.getTime() + random.int(2, 20) * DAY : requestedAt.getTime() + random.int(5, 12) * DAY)
        : null;
      scheduledAt?.setUTCHours(random.pick([8, 9, 10, 13, 14]), 0, 0, 0);
      const [inspection] = await db
        .insert(inspections)
        .values({
          machineId,
          requestedById: seller.id,
          status: plan.status,
          preferredDates: [0, 1, 2].map((d) => new Date(requestedAt.getTime() + (7 + d * 2) * DAY).toISOString().slice(0, 10)),
          siteAccessNotes: random.pick(SITE_NOTES),
          siteContactName: seller.name,
          siteContactPhone: `+00 ${random.int(100, 999)} ${random.int(1000, 9999)}`,
          inspectorId: booked ? inspector.id : null,
          scheduledAt,
          feeMinor: FEES.find((f) => f.sizeClass === sizeClassForSwing(model.swingMm))!.amountMinor,
          reviewerId: reachesIndex >= 4 ? coordinator.id : null,
          cancelReason: plan.status === 'cancelled' ? random.pick(CANCEL_REASONS) : null,
          createdAt: requestedAt,
        })
        .$returningId();
      const inspectionId = inspection!.id;

      const events = STATUS_PATH.slice(0, reachesIndex + 1).map((to, step) => ({
        inspectionId,
        fromStatus: step === 0 ? null : STATUS_PATH[step - 1]!,
        toStatus: to,
        actorId: to === 'requested' ? seller.id : to === 'on_site' || to === 'in_review' ? inspector.id : coordinator.id,
        createdAt: new Date(requestedAt.getTime() + step * 3 * DAY),
      }));
      if (plan.status === 'cancelled') {
        events.push({
          inspectionId,
          fromStatus: STATUS_PATH[reachesIndex]!,
          toStatus: 'cancelled',
          actorId: coordinator.id,
          createdAt: new Date(requestedAt.getTime() + (reachesIndex + 1) * 3 * DAY),
        });
      }
      await db.insert(inspectionStatusEvents).values(events.map((e) => ({ ...e, note: e.toStatus === 'cancelled' ? 'Cancelled on the seller’s request' : null })));
      created.push({ machineId, inspectionId, status: plan.status });
    }
  }
  return { workshops: workshopIds.length, users: accounts.length, machines: created.length };
}

async function main() {
  const ifEmpty = process.argv.includes('--if-empty');
  const [{ total }] = (await db.select({ total: count() }).from(users)) as [{ total: number }];
  if (ifEmpty && total > 0) {
    console.log('Demo data: database already has data, left as it is');
    return;
  }
  const summary = await seedDemo();
  console.log(`Demo data: ${summary.workshops} workshops, ${summary.users} people, ${summary.machines} machines`);
}

main()
  .catch((error) => {
    console.error('Seeding failed:', error instanceof Error ? error.message : error);
    process.exitCode = 1;
  })
  .finally(() => closeDatabase());
