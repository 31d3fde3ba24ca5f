import nodemailer from 'nodemailer';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import type { MailMessage } from './mail-message';
import { startMailSink, type MailSink } from './server';

async function send(sink: MailSink, mail: nodemailer.SendMailOptions): Promise<MailMessage> {
  const transport = nodemailer.createTransport({ host: '127.0.0.1', port: sink.smtpPort, secure: false, ignoreTLS: true });
  await transport.sendMail({ from: 'reports@waygrade.example', ...mail });
  const response = await fetch(`${sink.webUrl}/api/messages`);
  const { messages } = (await response.json()) as { messages: MailMessage[] };
  const [newest] = messages;
  if (!newest) throw new Error('message not stored');
  return newest;
}

describe('mail sink pages', () => {
  let sink: MailSink;
  beforeAll(async () => {
    sink = await startMailSink({ smtpPort: 0, webPort: 0 });
  });
  afterAll(() => sink.close());
  afterEach(async () => {
    await fetch(`${sink.webUrl}/api/messages`, { method: 'DELETE' });
  });

  it('says so when no mail has arrived', async () => {
    const html = await (await fetch(sink.webUrl)).text();
    expect(html).toContain('<title>Waygrade mail sink</title>');
    expect(html).toContain('No mail received yet.');
  });

  it('lists messages newest first with recipient, subject and time', async () => {
    await send(sink, { to: 'seller@example.test', subject: 'Survey booked for Tuesday', text: 'x' });
    const newest = await send(sink, { to: 'buyer@example.test', subject: 'Report ready', text: 'x' });
    const response = await fetch(sink.webUrl);
    const html = await response.text();

    expect(response.headers.get('content-security-policy')).toContain("default-src 'none'");
    expect(html.indexOf('Report ready')).toBeLessThan(html.indexOf('Survey booked for Tuesday'));
    expect(html).toContain('buyer@example.test');
    expect(html).toContain(`href="/messages/${newest.id}"`);
    expect(html).toContain(`<time datetime="${newest.receivedAt}">`);
  });

  it('filters the list by recipient from the query string', async () => {
    await send(sink, { to: 'seller@example.test', subject: 'Survey booked', text: 'x' });
    await send(sink, { to: 'buyer@example.test', subject: 'Report ready', text: 'x' });
    const html = await (await fetch(`${sink.webUrl}/?to=seller@example.test`)).text();
    expect(html).toContain('Survey booked');
    expect(html).not.toContain('Report ready');
  });

  it('shows one message with its text and its HTML in a sandboxed frame', async () => {
    const message = await send(sink, {
      to: 'buyer@example.test',
      subject: 'Report <ready>',
      text: 'Download it from your account.',
      html: '<p>Download it</p><script>alert(1)</script>',
    });
    const html = await (await fetch(`${sink.webUrl}/messages/${message.id}`)).text();

    expect(html).toContain('Report &lt;ready&gt;');
    expect(html).toContain('<pre>Download it from your account.</pre>');
    expect(html).toMatch(new RegExp(`<iframe title="HTML body" sandbox src="/messages/${message.id}/html">`));
    expect(html).not.toContain('<script>');
  });

  it('serves the HTML body under a policy that forbids scripts and remote loads', async () => {
    const message = await send(sink, { to: 'buyer@example.test', subject: 'HTML', html: '<p>Hello</p>' });
    const response = await fetch(`${sink.webUrl}/messages/${message.id}/html`);
    const policy = response.headers.get('content-security-policy') ?? '';

    expect((await response.text()).trim()).toBe('<p>Hello</p>');
    expect(policy).toContain("default-src 'none'");
    expect(policy).toContain('sandbox');
    expect(policy).not.toContain('script-src');
  });

  it('clears all mail from the page’s button', async () => {
    await send(sink, { to: 'buyer@example.test', subject: 'Report ready', text: 'x' });
    const response = await fetch(`${sink.webUrl}/messages/clear`, { method: 'POST', redirect: 'manual' });
    expect(response.status).toBe(303);
    expect(response.headers.get('location')).toBe('/');
    const { messages } = (await (await fetch(`${sink.webUrl}/api/messages`)).json()) as { messages: MailMessage[] };
    expect(messages).toEqual([]);
  });
});
