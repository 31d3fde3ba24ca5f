import 'server-only';
import { and, eq, inArray, isNull } from 'drizzle-orm';
import { inspections, machines, users } from '@/db/schema';
import { defineOperation, type Transaction } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { enqueueEmail } from '@/lib/mail/outbox';
import { appLink } from '@/lib/mail/links';
import { cancelReinspectionsBeforeVisit } from '@/lib/reinspection/refund-reinspections';
import { lazyProvider } from '@/lib/reinspection/listing-ended';
import { stripePaymentProvider } from '@/lib/payments/stripe-payment-provider';
import { bookingSchema, cancelSchema, inspectionRequestSchema } from '@/lib/validation/inspection';
import { lockInspectionForTransition, ownsMachine, takesPartIn } from './inspection-access';
import { moveInspection } from './status-events';

const OPEN_STATUSES = ['requested', 'booked', 'on_site', 'in_review'] as const;

export const requestInspection = defineOperation({
  name: 'inspection.request',
  entityType: 'inspection',
  access: 'inspection.request',
  input: inspectionRequestSchema,
  authorize: ({ actor, input }) => ownsMachine(actor, input.machineId),
  async run({ actor, input, tx }) {
    const [open] = await tx
      .select({ id: inspections.id })
      .from(inspections)
      .where(and(eq(inspections.machineId, input.machineId), inArray(inspections.status, [...OPEN_STATUSES])))
      .for('update');
    if (open) throw new AppError('conflict', 'This machine already has an inspection under way.');
    const [row] = await tx
      .insert(inspections)
      .values({
        machineId: input.machineId,
        requestedById: actor!.id,
        status: 'requested',
        preferredDates: input.preferredDates,
        siteAccessNotes: input.siteAccessNotes || null,
        siteContactName: input.siteContactName,
        siteContactPhone: input.siteContactPhone,
      })
      .$returningId();
    await moveInspection(tx, { inspectionId: row!.id, from: null, to: 'requested', actorId: actor!.id });
    // A listing with an inspection requested is on the market.
    await tx.update(machines).set({ listingStatus: 'listed' }).where(and(eq(machines.id, input.machineId), eq(machines.listingStatus, 'draft')));
    return { data: { inspectionId: row!.id }, entityId: row!.id };
  },
});

async function loadParties(tx: Transaction, inspectionId: number) {
  const [row] = await tx
    .select({
      maker: machines.maker,
      model: machines.model,
      serialNumber: machines.serialNumber,
      town: machines.town,
      region: machines.region,
      sellerEmail: users.email,
      sellerName: users.name,
    })
    .from(inspections)
    .innerJoin(machines, eq(machines.id, inspections.machineId))
    .innerJoin(users, eq(users.id, machines.sellerId))
    .where(eq(inspections.id, inspectionId));
  if (!row) throw new AppError('not_found');
  return row;
}

export const bookInspection = defineOperation({
  name: 'inspection.book',
  entityType: 'inspection',
  access: 'inspection.book',
  input: bookingSchema,
  async run({ actor, input, tx }) {
    const current = await lockInspectionForTransition(tx, input.inspectionId, actor!, 'booked');
    const [inspector] = await tx
      .select({ id: users.id, name: users.name, email: users.email })
      .from(users)
      .where(and(eq(users.id, input.inspectorId), eq(users.role, 'inspector'), isNull(users.deactivatedAt)));
    if (!inspector) throw new AppError('invalid_input', 'Choose an active inspector.', { inspectorId: ['Choose an active inspector'] });
    const scheduledAt = new Date(`${input.date}T${input.time}:00Z`);
    if (scheduledAt.getTime() < Date.now() - 60 * 60 * 1000) {
      throw new AppError('invalid_input', 'The visit cannot be booked in the past.', { date: ['Pick today or a later date'] });
    }
    const rescheduled = current.status === 'booked';
    await moveInspection(tx, {
      inspectionId: current.id,
      from: current.status,
      to: 'booked',
      actorId: actor!.id,
      note: rescheduled ? 'Visit moved' : null,
      changes: { inspectorId: inspector.id, scheduledAt, feeMinor: Math.round(input.feeEuros * 100) },
    });
    const parties = await loadParties(tx, current.id);
    const common = {
      machine: parties,
      scheduledAt,
      site: {
        town: parties.town,
        region: parties.region,
        accessNotes: current.siteAccessNotes,
        contactName: current.siteContactName,
        contactPhone: current.siteContactPhone,
      },
      inspectorName: inspector.name ?? inspector.email,
      rescheduled,
    };
    await enqueueEmail(tx, {
      to: parties.sellerEmail,
      template: 'inspection-booked',
      data: { ...common, recipientName: parties.sellerName, audience: 'seller', url: appLink(`/machines/${current.machineId}`) },
    });
    await enqueueEmail(tx, {
      to: inspector.email,
      template: 'inspection-booked',
      data: { ...common, recipientName: inspector.name, audience: 'inspector', url: appLink(`/jobs/${current.id}`) },
    });
    return { data: { inspectionId: current.id, scheduledAt: scheduledAt.toISOString() }, entityId: current.id, detail: { inspectorId: inspector.id, rescheduled } };
  },
});

export const cancelInspection = defineOperation({
  name: 'inspection.cancel',
  entityType: 'inspection',
  access: 'signed-in',
  input: cancelSchema,
  authorize: ({ actor, input }) => (actor?.role === 'seller' || actor?.role === 'admin') && takesPartIn(actor, input.inspectionId),
  async run({ actor, input, tx }) {
    const current = await lockInspectionForTransition(tx, input.inspectionId, actor!, 'cancelled');
    await moveInspection(tx, {
      inspectionId: current.id,
      from: current.status,
      to: 'cancelled',
      actorId: actor!.id,
      note: input.reason,
      changes: { cancelReason: input.reason },
    });
    const parties = await loadParties(tx, current.id);
    const machine = { maker: parties.maker, model: parties.model, serialNumber: parties.serialNumber };
    // Paid re-inspections of this visit get their fee back: the visit they paid for will not happen.
    if (current.status === 'requested' || current.status === 'booked') {
      await cancelReinspectionsBeforeVisit(
        tx,
        { machineId: current.machineId, onlyInspectionId: current.id, reason: `The re-inspection visit was cancelled before it started (${input.reason}), so the fee is refunded.`, actorId: actor!.id, cancelledBy: actor!.name ?? 'Waygrade' },
        lazyProvider(() => stripePaymentProvider()),
      );
    }
    const cancelledBy = actor!.role === 'admin' ? `${actor!.name ?? 'A coordinator'} (Waygrade)` : (actor!.name ?? 'The seller');
    await enqueueEmail(tx, {
      to: parties.sellerEmail,
      template: 'inspection-cancelled',
      data: { recipientName: parties.sellerName, audience: 'seller', machine, scheduledAt: current.scheduledAt, reason: input.reason, cancelledBy, url: appLink(`/machines/${current.machineId}`) },
    });
    if (current.inspectorId) {
      const [inspector] = await tx.select({ email: users.email, name: users.name }).from(users).where(eq(users.id, current.inspectorId));
      if (inspector) {
        await enqueueEmail(tx, {
          to: inspector.email,
          template: 'inspection-cancelled',
          data: { recipientName: inspector.name, audience: 'inspector', machine, scheduledAt: current.scheduledAt, reason: input.reason, cancelledBy, url: appLink('/jobs') },
        });
      }
    }
    return { data: { inspectionId: current.id }, entityId: current.id, detail: { reason: input.reason } };
  },
});
