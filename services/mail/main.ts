import { startMailSink } from './server';

// Runs the mail sink for the start and test scripts, configured by environment only.

const sink = await startMailSink({
  smtpPort: Number(process.env.MAIL_SMTP_PORT ?? 12025),
  webPort: Number(process.env.MAIL_WEB_PORT ?? 12080),
  host: process.env.MAIL_HOST ?? '127.0.0.1',
  logFile: process.env.MAIL_LOG_FILE || undefined,
});
console.log(`mail sink listening: SMTP on port ${sink.smtpPort}, web on ${sink.webUrl}`);

let stopping = false;
async function stop(): Promise<void> {
  if (stopping) return;
  stopping = true;
  await sink.close();
  process.exit(0);
}
process.on('SIGINT', () => void stop());
process.on('SIGTERM', () => void stop());
