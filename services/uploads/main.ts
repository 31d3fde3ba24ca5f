import path from 'node:path';
import { decodeUploadsToken, LOCAL_UPLOADS_TOKEN } from './local-token.js';
import { startUploadsStandIn } from './server.js';

// Runs the upload service for local development and tests:
//   node --import tsx services/uploads/main.ts
const DEFAULT_PORT = 12112;

const port = Number(process.env.UPLOADS_PORT ?? DEFAULT_PORT);
const dataDir = path.resolve(process.env.UPLOADS_DATA_DIR ?? '.data/uploads');
const { apiKey, appId } = decodeUploadsToken(process.env.UPLOADTHING_TOKEN ?? LOCAL_UPLOADS_TOKEN);
const publicUrl = process.env.UPLOADS_PUBLIC_URL ?? `http://localhost:${port}`;

const uploads = await startUploadsStandIn({
  port,
  host: process.env.UPLOADS_HOST ?? '127.0.0.1',
  apiKey,
  appId,
  dataDir,
  publicUrl,
  callbackUrl: process.env.UPLOADTHING_CALLBACK_URL,
});
console.log(`uploads: listening on ${uploads.url} for app ${appId}, files at ${publicUrl}/f/<key>, data in ${dataDir}`);

let stopping = false;
async function stop(signal: NodeJS.Signals): Promise<void> {
  if (stopping) return;
  stopping = true;
  console.log(`uploads: ${signal} received, closing`);
  await uploads.close();
  process.exit(0);
}
process.on('SIGINT', (signal) => void stop(signal));
process.on('SIGTERM', (signal) => void stop(signal));
