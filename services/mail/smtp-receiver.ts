import { randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import { simpleParser } from 'mailparser';
import { SMTPServer, type SMTPServerSession } from 'smtp-server';
import { toMailMessage } from './mail-message';
import type { MessageStore } from './message-store';

// The SMTP side of the sink: accepts any sender and recipient, with or without AUTH, and hands
// every message to the store. It never relays anything anywhere.

export const DEFAULT_MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

export function createSmtpReceiver(store: MessageStore, maxMessageBytes = DEFAULT_MAX_MESSAGE_BYTES): SMTPServer {
  return new SMTPServer({
    banner: 'Waygrade mail sink',
    size: maxMessageBytes,
    authOptional: true,
    // Credentials the app may be configured with are accepted as they are: nothing is protected here.
    allowInsecureAuth: true,
    onAuth(auth, _session, callback) {
      callback(null, { user: auth.username ?? 'anonymous' });
    },
    // Plain SMTP only: without a certificate STARTTLS would offer a self-signed one for nothing.
    disabledCommands: ['STARTTLS'],
    logger: false,
    closeTimeout: 1_000,
    onData(stream, session, callback) {
      receive(stream, session, store).then(
        () => callback(),
        (error: unknown) => callback(error instanceof Error ? error : new Error(String(error))),
      );
    },
  });
}

async function receive(stream: Readable & { sizeExceeded?: boolean }, session: SMTPServerSession, store: MessageStore) {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  if (stream.sizeExceeded) {
    throw Object.assign(new Error('Message exceeds the fixed maximum message size'), { responseCode: 552 });
  }
  const raw = Buffer.concat(chunks);
  const parsed = await simpleParser(raw);
  const { mailFrom, rcptTo } = session.envelope;
  store.add({
    message: toMailMessage(parsed, {
      id: randomUUID(),
      receivedAt: new Date(),
      envelope: {
        from: mailFrom ? mailFrom.address : null,
        to: rcptTo.map((recipient) => recipient.address),
      },
    }),
    raw,
    attachmentContents: parsed.attachments.map((attachment) => attachment.content),
  });
}
