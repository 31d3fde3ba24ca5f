import { request as httpRequest } from 'node:http';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { paymentEvents, surveys } from '@/db/schema';
import { sessionCookie } from '../support/private-stack';
import { completedSession, providerEvent, signedHeader } from '../support/purchase-fixtures';
import { bookedInspection } from './survey-fixtures';

const APP_URL = process.env.APP_URL ?? 'http://localhost:3100';
const MB = 1024 * 1024;

/**
 * Sends the head of a request that announces `declaredBytes` and only one small piece of its body,
 * then waits for an answer. A server that reads the whole body before answering never answers.
 */
function answerBeforeBody(path: string, method: string, headers: Record<string, string>, declaredBytes: number) {
  return new Promise<{ status: number; body: string }>((resolve, reject) => {
    const url = new URL(path, APP_URL);
    const req = httpRequest(url, { method, headers: { ...headers, 'content-type': 'application/json', 'content-length': String(declaredBytes) } });
    const timer = setTimeout(() => {
      req.destroy();
      reject(new Error(`${method} ${path} gave no answer within 10 s while its body was still coming`));
    }, 10_000);
    req.on('response', (response) => {
      let body = '';
      response.setEncoding('utf8');
      response.on('data', (chunk: string) => (body += chunk));
      response.on('end', () => {
        clearTimeout(timer);
        req.destroy();
        resolve({ status: response.statusCode ?? 0, body });
      });
    });
    req.on('error', (error) => {
      // The server may close the connection once it has answered; the answer is what counts.
      if (!req.destroyed) reject(error);
    });
    req.write('{"baseVersion":1,"data":{"notes":"');
  });
}

/** A body sent in chunks with no Content-Length, so only counting what arrives can stop it. */
function chunkedBody(totalBytes: number) {
  const chunk = new TextEncoder().encode('x'.repeat(64 * 1024));
  let sent = 0;
  return new ReadableStream<Uint8Array>({
    pull(controller) {
      if (sent === 0) controller.enqueue(new TextEncoder().encode('{"baseVersion":1,"data":{"notes":"'));
      if (sent >= totalBytes) {
        controller.enqueue(new TextEncoder().encode('"}}'));
        controller.close();
        return;
      }
      controller.enqueue(chunk);
      sent += chunk.byteLength;
    },
  });
}

describe('request body limits', () => {
  let inspectionId: number;
  let inspectorCookie: string;

  beforeAll(async () => {
    const booked = await bookedInspection({ start: true });
    inspectionId = booked.inspectionId;
    inspectorCookie = await sessionCookie({ id: booked.inspector.id, role: 'inspector', name: booked.inspector.name ?? '', email: '', sessionVersion: 0 });
  });
  afterAll(() => closeDatabase());

  it('answers a signed-out autosave announcing 50 MB with 401 before its body has arrived', async () => {
    const answer = await answerBeforeBody(`/api/surveys/${inspectionId}`, 'PUT', {}, 50 * MB);
    expect(answer.status).toBe(401);
    expect(JSON.parse(answer.body)).toMatchObject({ ok: false, code: 'unauthenticated' });
  });

  it('answers a signed-in autosave announcing 50 MB with 413 before its body has arrived, and keeps the survey', async () => {
    const [before] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
    const answer = await answerBeforeBody(`/api/surveys/${inspectionId}`, 'PUT', { cookie: inspectorCookie }, 50 * MB);
    expect(answer.status).toBe(413);
    expect(JSON.parse(answer.body)).toMatchObject({ ok: false, code: 'too_large' });
    const [after] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
    expect(after!.version).toBe(before!.version);
  });

  it('answers 413 to a 2 MB autosave sent in chunks without a length, and keeps the survey', async () => {
    const [before] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
    const response = await fetch(`${APP_URL}/api/surveys/${inspectionId}`, {
      method: 'PUT',
      headers: { 'content-type': 'application/json', cookie: inspectorCookie },
      body: chunkedBody(2 * MB),
      duplex: 'half',
    } as RequestInit);
    expect(response.status).toBe(413);
    expect(await response.json()).toMatchObject({ ok: false, code: 'too_large' });
    const [after] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
    expect(after!.version).toBe(before!.version);
    expect(after!.data).toEqual(before!.data);
  });

  it('still takes an ordinary autosave', async () => {
    const [current] = await db.select().from(surveys).where(eq(surveys.inspectionId, inspectionId));
    const response = await fetch(`${APP_URL}/api/surveys/${inspectionId}`, {
      method: 'PUT',
      headers: { 'content-type': 'application/json', cookie: inspectorCookie },
      body: JSON.stringify({ baseVersion: current!.version, data: current!.data }),
    });
    expect(response.status).toBe(200);
  });

  it('answers 413 to a signed payment event over 256 kB and records nothing', async () => {
    const event = providerEvent('checkout.session.completed', { ...completedSession('cs_test_oversized', 1, 'pi_oversized'), padding: 'x'.repeat(300 * 1024) });
    const body = JSON.stringify(event);
    const response = await fetch(`${APP_URL}/api/payments/webhook`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'stripe-signature': signedHeader(body) },
      body,
    });
    expect(response.status).toBe(413);
    expect(await db.select().from(paymentEvents).where(eq(paymentEvents.providerEventId, event.id))).toHaveLength(0);
  });
});
