import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { MessageStore } from './message-store';
import { createSmtpReceiver, DEFAULT_MAX_MESSAGE_BYTES } from './smtp-receiver';
import { handleWebRequest } from './web-routes';

// The mail sink: catches every e-mail the app sends over SMTP (through nodemailer, configured by
// environment like any SMTP server) and shows it on a web page and a JSON API.

export interface MailSinkOptions {
  smtpPort: number;
  webPort: number;
  host?: string;
  /** Also append every message as one JSON line to this file. */
  logFile?: string;
  maxMessageBytes?: number;
}

export interface MailSink {
  smtpPort: number;
  webUrl: string;
  close(): Promise<void>;
}

export async function startMailSink(options: MailSinkOptions): Promise<MailSink> {
  const host = options.host ?? '127.0.0.1';
  const store = new MessageStore(options.logFile);
  const smtp = createSmtpReceiver(store, options.maxMessageBytes ?? DEFAULT_MAX_MESSAGE_BYTES);
  const web = createServer((request, response) => {
    handleWebRequest(request, response, store).catch((error: unknown) => {
      console.error('mail sink: request failed', error);
      if (!response.headersSent) response.writeHead(500);
      response.end();
    });
  });

  await new Promise<void>((resolve, reject) => {
    smtp.server.once('error', reject);
    smtp.listen(options.smtpPort, host, () => {
      smtp.server.off('error', reject);
      resolve();
    });
  });
  try {
    await new Promise<void>((resolve, reject) => {
      web.once('error', reject);
      web.listen(options.webPort, host, () => {
        web.off('error', reject);
        resolve();
      });
    });
  } catch (error) {
    await new Promise<void>((resolve) => smtp.close(() => resolve()));
    throw error;
  }
  const smtpPort = (smtp.server.address() as AddressInfo).port;
  const webPort = (web.address() as AddressInfo).port;

  return {
    smtpPort,
    webUrl: `http://${browserHost(host)}:${webPort}`,
    async close() {
      await Promise.all([
        new Promise<void>((resolve) => smtp.close(() => resolve())),
        new Promise<void>((resolve, reject) => {
          web.close((error) => (error ? reject(error) : resolve()));
          web.closeAllConnections();
        }),
      ]);
      await store.flush();
    },
  };
}

/** Browsers use localhost for a loopback or wildcard bind, as for the app itself (see stack notes). */
function browserHost(host: string): string {
  const loopbackOrAny = ['127.0.0.1', '::1', 'localhost', '0.0.0.0', '::'];
  if (loopbackOrAny.includes(host)) return 'localhost';
  return host.includes(':') ? `[${host}]` : host;
}
