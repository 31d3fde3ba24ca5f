import type { IncomingMessage, ServerResponse } from 'node:http';
import { z } from 'zod';
import { readBody, sendJson } from './http-io';
import type { PaymentsState } from './payments-state';
import type { StripeEvent } from './stripe-objects';
import type { WebhookDispatcher } from './webhook-dispatcher';

// `/__control/…`: a JSON API for tests and fault drills that Stripe itself does not have. It
// shows which events exist and how each delivery went, and switches on the ways webhook
// delivery can go wrong in production (duplicates, delays, reordering, redelivery).

const deliverySettingsInput = z.strictObject({
  duplicate: z.boolean().optional(),
  delayMs: z.number().int().min(0).max(600_000).optional(),
  reorder: z.boolean().optional(),
  endpointUrl: z.url().optional(),
});

const IDLE_WAIT_LIMIT_MS = 120_000;

interface ControlDeps {
  state: PaymentsState;
  dispatcher: WebhookDispatcher;
  retryDelaysMs: readonly number[];
  reset(): void;
}

export async function handleControlRequest(
  request: IncomingMessage,
  response: ServerResponse,
  url: URL,
  deps: ControlDeps,
): Promise<void> {
  const { state, dispatcher } = deps;
  const method = request.method ?? 'GET';
  const path = url.pathname;

  if (method === 'GET' && path === '/__control/health') {
    sendJson(response, 200, { ok: true });
    return;
  }

  if (method === 'GET' && path === '/__control/events') {
    const type = url.searchParams.get('type');
    const events = [...state.events.values()].filter((event) => !type || event.type === type);
    sendJson(response, 200, { data: events.map((event) => describeEvent(event, dispatcher)) });
    return;
  }

  const eventMatch = /^\/__control\/events\/([^/]+)$/.exec(path);
  if (method === 'GET' && eventMatch) {
    const event = state.events.get(decodeURIComponent(eventMatch[1] ?? ''));
    if (!event) sendJson(response, 404, { error: 'no such event' });
    else sendJson(response, 200, describeEvent(event, dispatcher));
    return;
  }

  const redeliverMatch = /^\/__control\/redeliver\/([^/]+)$/.exec(path);
  if (method === 'POST' && redeliverMatch) {
    const event = state.events.get(decodeURIComponent(redeliverMatch[1] ?? ''));
    if (!event) {
      sendJson(response, 404, { error: 'no such event' });
      return;
    }
    sendJson(response, 202, dispatcher.redeliver(event));
    return;
  }

  if (path === '/__control/delivery' && method === 'GET') {
    sendJson(response, 200, deliveryDescription(deps));
    return;
  }

  if (path === '/__control/delivery' && (method === 'PUT' || method === 'POST')) {
    const parsed = deliverySettingsInput.safeParse(parseJson(await readBody(request)));
    if (!parsed.success) {
      sendJson(response, 400, { error: z.prettifyError(parsed.error) });
      return;
    }
    const { endpointUrl, ...settings } = parsed.data;
    if (endpointUrl) dispatcher.endpointUrl = endpointUrl;
    dispatcher.updateSettings(settings);
    sendJson(response, 200, deliveryDescription(deps));
    return;
  }

  if (method === 'POST' && path === '/__control/release') {
    sendJson(response, 200, { released: dispatcher.releaseHeld() });
    return;
  }

  if (method === 'GET' && path === '/__control/idle') {
    // Lets a test wait until every due webhook attempt has been made, instead of sleeping.
    const limit = Math.min(Number(url.searchParams.get('timeoutMs') ?? 10_000) || 0, IDLE_WAIT_LIMIT_MS);
    let timer: NodeJS.Timeout | undefined;
    const idle = await Promise.race([
      dispatcher.whenIdle().then(() => true),
      new Promise<boolean>((resolve) => (timer = setTimeout(() => resolve(false), limit))),
    ]);
    clearTimeout(timer);
    sendJson(response, idle ? 200 : 408, { idle });
    return;
  }

  if (method === 'POST' && path === '/__control/reset') {
    deps.reset();
    sendJson(response, 200, { reset: true });
    return;
  }

  sendJson(response, 404, { error: `no control route ${method} ${path}` });
}

function describeEvent(event: StripeEvent, dispatcher: WebhookDispatcher) {
  return {
    id: event.id,
    type: event.type,
    created: event.created,
    objectId: event.data.object.id,
    deliveries: dispatcher.deliveriesFor(event.id),
    event,
  };
}

function deliveryDescription(deps: ControlDeps) {
  return {
    endpointUrl: deps.dispatcher.endpointUrl,
    retryDelaysMs: deps.retryDelaysMs,
    ...deps.dispatcher.currentSettings(),
  };
}

function parseJson(text: string): unknown {
  try {
    return text ? JSON.parse(text) : {};
  } catch {
    return undefined;
  }
}
