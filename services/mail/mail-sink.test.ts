import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import nodemailer from 'nodemailer';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import type { MailMessage } from './mail-message';
import { startMailSink, type MailSink } from './server';

function transportTo(sink: MailSink) {
  return nodemailer.createTransport({ host: '127.0.0.1', port: sink.smtpPort, secure: false, ignoreTLS: true });
}

async function getJson<T>(sink: MailSink, path: string, init?: RequestInit): Promise<{ status: number; body: T }> {
  const response = await fetch(`${sink.webUrl}${path}`, init);
  return { status: response.status, body: (await response.json()) as T };
}

describe('mail sink', () => {
  let sink: MailSink;
  let logDirectory: string;
  beforeAll(async () => {
    logDirectory = await mkdtemp(join(tmpdir(), 'waygrade-mail-'));
    sink = await startMailSink({ smtpPort: 0, webPort: 0, logFile: join(logDirectory, 'mail.jsonl') });
  });
  afterAll(async () => {
    await sink.close();
    await rm(logDirectory, { recursive: true, force: true });
  });
  afterEach(async () => {
    await fetch(`${sink.webUrl}/api/messages`, { method: 'DELETE' });
  });

  it('keeps a message sent through nodemailer with its headers, text and HTML', async () => {
    const info = await transportTo(sink).sendMail({
      from: 'Waygrade <reports@waygrade.example>',
      to: 'Ines Varga <buyer@example.test>',
      cc: 'desk@example.test',
      subject: 'Your inspection report is ready',
      text: 'The report for the centre lathe is ready to download.',
      html: '<p>The report for the <strong>centre lathe</strong> is ready to download.</p>',
    });

    const { body } = await getJson<{ messages: MailMessage[] }>(sink, '/api/messages');
    expect(body.messages).toHaveLength(1);
    const [message] = body.messages;
    expect(message).toMatchObject({
      subject: 'Your inspection report is ready',
      from: [{ address: 'reports@waygrade.example', name: 'Waygrade' }],
      to: [{ address: 'buyer@example.test', name: 'Ines Varga' }],
      cc: [{ address: 'desk@example.test', name: '' }],
      text: 'The report for the centre lathe is ready to download.',
      html: '<p>The report for the <strong>centre lathe</strong> is ready to download.</p>',
      messageId: info.messageId,
      envelope: { from: 'reports@waygrade.example', to: ['buyer@example.test', 'desk@example.test'] },
    });
    expect(Date.parse(message?.date ?? '')).not.toBeNaN();

    const single = await getJson<MailMessage>(sink, `/api/messages/${message?.id}`);
    expect(single.body).toEqual(message);
  });

  it('lists newest first and filters by recipient, Bcc included', async () => {
    const transport = transportTo(sink);
    await transport.sendMail({ from: 'reports@waygrade.example', to: 'seller@example.test', subject: 'Survey booked', text: '1' });
    await transport.sendMail({ from: 'reports@waygrade.example', to: 'buyer@example.test', subject: 'Report ready', text: '2' });
    await transport.sendMail({
      from: 'reports@waygrade.example',
      to: 'buyer@example.test',
      bcc: 'audit@example.test',
      subject: 'Refund issued',
      text: '3',
    });

    const all = await getJson<{ messages: MailMessage[] }>(sink, '/api/messages');
    expect(all.body.messages.map((message) => message.subject)).toEqual(['Refund issued', 'Report ready', 'Survey booked']);
    const forBuyer = await getJson<{ messages: MailMessage[] }>(sink, '/api/messages?to=BUYER@example.test');
    expect(forBuyer.body.messages.map((message) => message.subject)).toEqual(['Refund issued', 'Report ready']);
    const forAudit = await getJson<{ messages: MailMessage[] }>(sink, '/api/messages?to=audit@example.test');
    expect(forAudit.body.messages.map((message) => message.subject)).toEqual(['Refund issued']);
    const forNobody = await getJson<{ messages: MailMessage[] }>(sink, '/api/messages?to=nobody@example.test');
    expect(forNobody.body.messages).toEqual([]);
  });

  it('keeps an attachment and serves its bytes', async () => {
    const report = Buffer.from('%PDF-1.7 graded report for a centre lathe\n');
    await transportTo(sink).sendMail({
      from: 'reports@waygrade.example',
      to: 'buyer@example.test',
      subject: 'Report attached',
      text: 'See attachment.',
      attachments: [{ filename: 'report-12.pdf', content: report, contentType: 'application/pdf' }],
    });

    const { body } = await getJson<{ messages: MailMessage[] }>(sink, '/api/messages');
    const [message] = body.messages;
    expect(message?.attachments).toMatchObject([{ index: 0, filename: 'report-12.pdf', contentType: 'application/pdf', size: report.length }]);
    const download = await fetch(`${sink.webUrl}/api/messages/${message?.id}/attachments/0`);
    expect(download.headers.get('content-type')).toBe('application/pdf');
    expect(download.headers.get('content-disposition')).toContain('report-12.pdf');
    expect(Buffer.from(await download.arrayBuffer())).toEqual(report);
    expect((await fetch(`${sink.webUrl}/api/messages/${message?.id}/attachments/1`)).status).toBe(404);
  });

  it('serves the raw source as received', async () => {
    await transportTo(sink).sendMail({
      from: 'reports@waygrade.example',
      to: 'buyer@example.test',
      subject: 'Raw check',
      text: 'x',
      headers: { 'X-Waygrade-Report': '12' },
    });
    const { body } = await getJson<{ messages: MailMessage[] }>(sink, '/api/messages');
    const raw = await (await fetch(`${sink.webUrl}/api/messages/${body.messages[0]?.id}/raw`)).text();
    expect(raw).toMatch(/^X-Waygrade-Report: 12\r$/m);
  });

  it('clears every message', async () => {
    const transport = transportTo(sink);
    await transport.sendMail({ from: 'reports@waygrade.example', to: 'a@example.test', subject: 'One', text: '1' });
    await transport.sendMail({ from: 'reports@waygrade.example', to: 'b@example.test', subject: 'Two', text: '2' });

    const deleted = await getJson<{ deleted: number }>(sink, '/api/messages', { method: 'DELETE' });
    expect(deleted.body.deleted).toBe(2);
    const after = await getJson<{ messages: MailMessage[] }>(sink, '/api/messages');
    expect(after.body.messages).toEqual([]);
  });

  it('waits for a first message when asked to', async () => {
    const waiting = getJson<{ messages: MailMessage[] }>(sink, '/api/messages?to=late@example.test&waitMs=3000');
    setTimeout(() => {
      void transportTo(sink).sendMail({ from: 'reports@waygrade.example', to: 'late@example.test', subject: 'Late', text: 'x' });
    }, 100);
    const { body } = await waiting;
    expect(body.messages.map((message) => message.subject)).toEqual(['Late']);
  });

  it('answers an unknown message with 404', async () => {
    expect((await getJson(sink, '/api/messages/no-such-id')).status).toBe(404);
  });

  it('appends each message to the log file as one JSON line', async () => {
    await transportTo(sink).sendMail({ from: 'reports@waygrade.example', to: 'log@example.test', subject: 'Logged', text: 'x' });
    // The line is written after the SMTP reply, so poll briefly for it.
    await vi.waitFor(async () => {
      const lines = (await readFile(join(logDirectory, 'mail.jsonl'), 'utf8')).trim().split('\n');
      const last = JSON.parse(lines.at(-1) ?? '{}') as MailMessage;
      expect(last).toMatchObject({ subject: 'Logged', to: [{ address: 'log@example.test' }] });
    });
  });
});

describe('mail sink size limit', () => {
  let sink: MailSink;
  beforeAll(async () => {
    sink = await startMailSink({ smtpPort: 0, webPort: 0, maxMessageBytes: 2_000 });
  });
  afterAll(() => sink.close());

  it('refuses a message over the limit and keeps nothing', async () => {
    const send = transportTo(sink).sendMail({
      from: 'reports@waygrade.example',
      to: 'buyer@example.test',
      subject: 'Too big',
      text: 'x'.repeat(10_000),
    });
    await expect(send).rejects.toMatchObject({ responseCode: 552 });
    const { body } = await getJson<{ messages: MailMessage[] }>(sink, '/api/messages');
    expect(body.messages).toEqual([]);
  });
});
