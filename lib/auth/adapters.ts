import 'server-only';
import { NextResponse, type NextRequest } from 'next/server';
import type { z } from 'zod';
import { httpStatus } from '@/lib/errors';
import { currentActor, currentClientIp as clientIp } from './current-actor';
import type { Operation, OperationResult } from './operation';

/** Runs an operation for the signed-in user of the current request (for server actions). */
export async function runAsCurrentUser<S extends z.ZodType, T>(operation: Operation<S, T>, raw: unknown): Promise<OperationResult<T>> {
  return operation.execute(await currentActor(), raw, { ip: await clientIp() });
}

/** A route handler that reads its input from the JSON body (POST/PUT/PATCH) or the query string (GET). */
export function routeHandler<S extends z.ZodType, T>(
  operation: Operation<S, T>,
  options: { input?: 'json' | 'query'; params?: boolean } = {},
) {
  return async (request: NextRequest, context: { params: Promise<Record<string, string>> }) => {
    let raw: Record<string, unknown> = {};
    if ((options.input ?? (request.method === 'GET' ? 'query' : 'json')) === 'query') {
      raw = Object.fromEntries(request.nextUrl.searchParams);
    } else {
      try {
        const body: unknown = await request.json();
        raw = body && typeof body === 'object' && !Array.isArray(body) ? (body as Record<string, unknown>) : { body };
      } catch {
        return NextResponse.json({ ok: false, code: 'invalid_input', message: 'The request body is not valid JSON.' }, { status: 400 });
      }
    }
    const params = context?.params ? await context.params : {};
    const result = await operation.execute(await currentActor(), { ...raw, ...params }, { ip: await clientIp() });
    return NextResponse.json(result, { status: result.ok ? 200 : httpStatus(result.code) });
  };
}
