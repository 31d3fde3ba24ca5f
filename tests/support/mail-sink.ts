// Reads what the app sent from the local mail sink's JSON API (services/mail).
const MAIL_WEB_URL = process.env.MAIL_WEB_URL ?? 'http://localhost:12180';

type Summary = { id: string; subject: string; to: Array<{ address: string }> };
export type SunkMail = { id: string; subject: string; text: string; html: string; to: Array<{ address: string }> };

/** The newest mail to an address whose subject contains `subject`, waiting up to `timeoutMs` for it. */
export async function waitForMail(to: string, subject: string, timeoutMs = 30_000): Promise<SunkMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const response = await fetch(`${MAIL_WEB_URL}/api/messages?to=${encodeURIComponent(to)}&waitMs=2000`);
    const { messages } = (await response.json()) as { messages: Summary[] };
    const match = messages.find((message) => message.subject.includes(subject));
    if (match) return (await (await fetch(`${MAIL_WEB_URL}/api/messages/${match.id}`)).json()) as SunkMail;
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
  throw new Error(`No mail to ${to} with "${subject}" within ${timeoutMs} ms`);
}

/** The first link in a mail's text that starts with the given path, e.g. "/confirm-email". */
export function linkFrom(mail: SunkMail, path: string): string {
  const url = mail.text.split(/\s+/).find((word) => {
    try {
      return new URL(word).pathname === path;
    } catch {
      return false;
    }
  });
  if (!url) throw new Error(`No ${path} link in "${mail.subject}"`);
  return url;
}
