// The uploadthing SDK reads its credentials from one token: base64 of JSON
// { apiKey, appId, regions }. The SDK's schema insists the apiKey starts with "sk_"
// and that regions is non-empty, so the local defaults follow those rules.

export interface UploadsCredentials {
  apiKey: string;
  appId: string;
  regions: string[];
}

export const LOCAL_UPLOADS_CREDENTIALS: UploadsCredentials = {
  apiKey: 'sk_live_waygrade_local_0f3c9a7e52d14b8e9a6c1d2e3f405162',
  appId: 'waygrade-local',
  regions: ['local'],
};

export function encodeUploadsToken(credentials: UploadsCredentials): string {
  return Buffer.from(JSON.stringify(credentials), 'utf8').toString('base64');
}

/** Reads a token the same way the SDK does and refuses the shapes the SDK would refuse. */
export function decodeUploadsToken(token: string): UploadsCredentials {
  let parsed: unknown;
  try {
    parsed = JSON.parse(Buffer.from(token, 'base64').toString('utf8'));
  } catch {
    throw new Error('UPLOADTHING_TOKEN is not base64-encoded JSON');
  }
  const { apiKey, appId, regions } = (parsed ?? {}) as Record<string, unknown>;
  if (typeof apiKey !== 'string' || !apiKey.startsWith('sk_')) {
    throw new Error('UPLOADTHING_TOKEN needs an apiKey starting with "sk_"');
  }
  if (typeof appId !== 'string' || appId.length === 0) {
    throw new Error('UPLOADTHING_TOKEN needs an appId');
  }
  if (!Array.isArray(regions) || regions.length === 0 || !regions.every((r) => typeof r === 'string')) {
    throw new Error('UPLOADTHING_TOKEN needs a non-empty list of regions');
  }
  return { apiKey, appId, regions: regions as string[] };
}

export const LOCAL_UPLOADS_TOKEN = encodeUploadsToken(LOCAL_UPLOADS_CREDENTIALS);
