// Runs once when an app server starts. The e-mail outbox worker lives in the Node.js runtime only;
// NEXT_RUNTIME is a constant Next.js inlines at build time, not configuration, so it is read here.
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  // The configuration is checked before the server takes a request: a production deployment with a
  // published local secret does not start.
  const { env } = await import('@/lib/env');
  env();
  const { startOutboxWorker } = await import('@/lib/mail/worker');
  startOutboxWorker();
  // Each released report's PDF is rendered once, here, and stored with its SHA-256.
  const { startReportPdfWorker } = await import('@/lib/pdf/pdf-worker');
  startReportPdfWorker();
  // Refunds owed for re-inspections cancelled by a sale are tried again until the provider accepts them.
  const { startReinspectionRefundWorker } = await import('@/lib/reinspection/refund-worker');
  startReinspectionRefundWorker();
}
