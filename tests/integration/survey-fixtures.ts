import { randomUUID } from 'node:crypto';
import { db } from '@/db/client';
import { inspections, machines, photos, users } from '@/db/schema';
import type { Actor } from '@/lib/auth/operation';
import { startVisit } from '@/lib/survey/server/start-visit';

/** A fresh inspector, seller, machine and booked inspection for one test, so tests never share rows. */
export async function bookedInspection(options: { start?: boolean } = {}) {
  const tag = randomUUID().slice(0, 8);
  const inspector: Actor = { id: randomUUID(), role: 'inspector', name: `Inspector ${tag}` };
  const sellerId = randomUUID();
  await db.insert(users).values([
    { id: inspector.id, name: inspector.name, email: `inspector-${tag}@survey-tests.example`, role: 'inspector' },
    { id: sellerId, name: `Seller ${tag}`, email: `seller-${tag}@survey-tests.example`, role: 'seller' },
  ]);
  const [machine] = await db
    .insert(machines)
    .values({
      sellerId,
      maker: 'Harlow',
      model: `HL-300 ${tag}`,
      yearBuilt: 2004,
      swingMm: 300,
      betweenCentresMm: 750,
      sizeClass: 'small',
      town: 'Brenmark',
      region: 'Brenmark valley',
      listingStatus: 'listed',
    })
    .$returningId();
  const [inspection] = await db
    .insert(inspections)
    .values({ machineId: machine!.id, requestedById: sellerId, status: 'booked', inspectorId: inspector.id, scheduledAt: new Date() })
    .$returningId();
  const inspectionId = inspection!.id;
  if (options.start) {
    const started = await startVisit.execute(inspector, { inspectionId });
    if (!started.ok) throw new Error(`could not start the visit: ${started.message}`);
  }
  return { inspector, inspectionId, machineId: machine!.id };
}

export async function otherInspector(): Promise<Actor> {
  const id = randomUUID();
  await db.insert(users).values({ id, name: 'Another inspector', email: `other-${id.slice(0, 8)}@survey-tests.example`, role: 'inspector' });
  return { id, role: 'inspector' };
}

/** A photo row as the upload pipeline records it, for tests that need one without uploading. */
export async function recordedPhoto(inspectionId: number, machineId: number, uploadedById: string) {
  await db.insert(photos).values({
    inspectionId,
    machineId,
    section: 'identity',
    fileKey: `test-${randomUUID()}`,
    originalUrl: 'http://localhost/f/test',
    displayKey: 'display',
    thumbKey: 'thumb',
    widthPx: 1600,
    heightPx: 1200,
    bytes: 1000,
    uploadedById,
  });
}
