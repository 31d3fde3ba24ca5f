import type { NextRequest } from 'next/server';
import { routeHandler } from '@/lib/auth/adapters';
import { privateJson } from '@/lib/http/private-json';
import { readSurvey } from '@/lib/survey/server/read-survey';
import { saveSurvey } from '@/lib/survey/server/save-survey';

type Context = { params: Promise<Record<string, string>> };

const read = routeHandler(readSurvey, { input: 'query' });
// A whole survey is a few kilobytes (the example surveys are 1-9 kB); a megabyte leaves room for long
// notes on every item while refusing a body no phone sends.
const SURVEY_MAX_BODY_BYTES = 1024 * 1024;

const save = routeHandler(saveSurvey, { input: 'json', maxBodyBytes: SURVEY_MAX_BODY_BYTES });

/** GET: the saved survey, `{ ok, data: { version, data, status, submittedAt, updatedAt } }`. */
export function GET(request: NextRequest, context: Context) {
  return read(request, context);
}

/**
 * PUT `{ baseVersion, data }`: 200 `{ ok, data: { version } }`, or 409 with the server's
 * current survey under `current`, so the phone can say what happened and keep its own edits.
 */
export async function PUT(request: NextRequest, context: Context) {
  const response = await save(request, context);
  if (response.status !== 409) return response;
  const refusal = (await response.json()) as Record<string, unknown>;
  const current = (await (await read(request, context)).json()) as { ok: boolean; data?: unknown };
  return privateJson({ ...refusal, current: current.ok ? current.data : null }, { status: 409 });
}
