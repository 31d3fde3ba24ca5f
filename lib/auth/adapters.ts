import 'server-only';
import type { NextRequest } from 'next/server';
import type { z } from 'zod';
import { AppError, httpStatus } from '@/lib/errors';
import { privateJson } from '@/lib/http/private-json';
import { readLimitedBody } from '@/lib/http/read-limited-body';
import { currentActor, currentClientIp as clientIp } from './current-actor';
import type { Operation, OperationResult } from './operation';

/** The most a JSON body may carry unless the route says otherwise. */
export const DEFAULT_MAX_BODY_BYTES = 64 * 1024;

/** Runs an operation for the signed-in user of the current request (for server actions). */
export async function runAsCurrentUser<S extends z.ZodType, T>(operation: Operation<S, T>, raw: unknown): Promise<OperationResult<T>> {
  return operation.execute(await currentActor(), raw, { ip: await clientIp() });
}

function refusal(code: 'unauthenticated' | 'too_large' | 'invalid_input', message?: string) {
  const error = new AppError(code, message);
  // Past the limit the rest of the body is never read: close the connection rather than let the
  // client send the remainder into it or reuse it for its next request (RFC 9110, 413).
  const headers: Record<string, string> = code === 'too_large' ? { Connection: 'close' } : {};
  return privateJson({ ok: false, code, message: error.message }, { status: httpStatus(code), headers });
}

/**
 * A route handler that reads its input from the JSON body (POST/PUT/PATCH) or the query string (GET).
 * The session is checked before the body is read, the body is read no further than `maxBodyBytes`
 * (413 past it), and every answer is marked private, no-store.
 */
export function routeHandler<S extends z.ZodType, T>(
  operation: Operation<S, T>,
  options: { input?: 'json' | 'query'; params?: boolean; maxBodyBytes?: number } = {},
) {
  return async (request: NextRequest, context: { params: Promise<Record<string, string>> }) => {
    const actor = await currentActor();
    // A signed-out request is refused before its body is read: no one without a session makes us buffer or parse.
    if (operation.definition.access !== 'public' && !actor) return refusal('unauthenticated');
    let raw: Record<string, unknown> = {};
    if ((options.input ?? (request.method === 'GET' ? 'query' : 'json')) === 'query') {
      raw = Object.fromEntries(request.nextUrl.searchParams);
    } else {
      let text: string;
      try {
        text = await readLimitedBody(request, options.maxBodyBytes ?? DEFAULT_MAX_BODY_BYTES);
      } catch (error) {
        if (error instanceof AppError && error.code === 'too_large') return refusal('too_large');
        return refusal('invalid_input', 'The request body could not be read.');
      }
      try {
        const body: unknown = JSON.parse(text);
        raw = body && typeof body === 'object' && !Array.isArray(body) ? (body as Record<string, unknown>) : { body };
      } catch {
        return refusal('invalid_input', 'The request body is not valid JSON.');
      }
    }
    const params = context?.params ? await context.params : {};
    const result = await operation.execute(actor, { ...raw, ...params }, { ip: await clientIp() });
    return privateJson(result, { status: result.ok ? 200 : httpStatus(result.code) });
  };
}
