import { NextResponse } from 'next/server';

/**
 * A JSON answer meant for one person (their session's data, or a refusal of their request): no
 * browser, proxy or CDN may keep it, so a shared cache never hands it to someone else and the
 * back button never shows a signed-out person what was there before.
 */
export function privateJson(body: unknown, init: { status?: number; headers?: Record<string, string> } = {}) {
  return NextResponse.json(body, { status: init.status, headers: { ...init.headers, 'Cache-Control': 'private, no-store' } });
}
