// Run as a child process with DATABASE_URL set to a private primary (see private-stack.ts): creates
// the rows the replica test reads and writes, with the same fixtures the shared-database tests use,
// and prints their ids as one JSON line.
import { closeDatabase, db } from '@/db/client';
import { reportAccessGrants } from '@/db/schema';
import { createAccount } from './accounts';
import { createReleasedReport } from './purchase-fixtures';
import { bookedInspection } from '../integration/survey-fixtures';

const report = await createReleasedReport({ maker: 'Corvane', model: 'CL-330 replica' });
const dealer = await createAccount('dealer');
const buyer = await createAccount('buyer');
await db.insert(reportAccessGrants).values({ reportId: report.reportId, userId: dealer.id, reason: 'purchase' });
const { inspector, inspectionId } = await bookedInspection({ start: true });
await closeDatabase();
console.log(
  JSON.stringify({
    reportId: report.reportId,
    machineId: report.machineId,
    dealer: { id: dealer.id, role: dealer.role, name: dealer.name, email: dealer.email, sessionVersion: 0 },
    buyer: { id: buyer.id, role: buyer.role, name: buyer.name, email: buyer.email, sessionVersion: 0 },
    inspector: { id: inspector.id, role: inspector.role, name: inspector.name ?? '', email: '', sessionVersion: 0 },
    inspectionId,
  }),
);
