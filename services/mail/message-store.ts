import { appendFile, mkdir } from 'node:fs/promises';
import { dirname } from 'node:path';
import { recipientsOf, type MailMessage, type StoredMail } from './mail-message';

// Received mail, newest first, in memory. With a log file each message is also appended as one
// JSON line, so mail sent during a run can be read after the sink has stopped.

type Listener = (message: MailMessage) => void;

export class MessageStore {
  private readonly mails: StoredMail[] = [];
  private readonly listeners = new Set<Listener>();
  private pendingWrite: Promise<void> = Promise.resolve();

  constructor(private readonly logFile?: string) {}

  add(mail: StoredMail): void {
    this.mails.unshift(mail);
    if (this.logFile) this.appendToLog(this.logFile, mail.message);
    for (const listener of this.listeners) listener(mail.message);
  }

  list(recipient?: string): MailMessage[] {
    const messages = this.mails.map((mail) => mail.message);
    return recipient ? messages.filter((message) => isAddressedTo(message, recipient)) : messages;
  }

  get(id: string): StoredMail | undefined {
    return this.mails.find((mail) => mail.message.id === id);
  }

  clear(): number {
    const count = this.mails.length;
    this.mails.length = 0;
    return count;
  }

  /** Resolves with the first message for `recipient` that arrives within `timeoutMs`, else null. */
  waitForMessage(recipient: string | undefined, timeoutMs: number): Promise<MailMessage | null> {
    return new Promise((resolve) => {
      const listener: Listener = (message) => {
        if (recipient && !isAddressedTo(message, recipient)) return;
        finish(message);
      };
      const timer = setTimeout(() => finish(null), timeoutMs);
      const finish = (message: MailMessage | null) => {
        clearTimeout(timer);
        this.listeners.delete(listener);
        resolve(message);
      };
      this.listeners.add(listener);
    });
  }

  /** Resolves once every log line written so far is on disk. */
  flush(): Promise<void> {
    return this.pendingWrite;
  }

  private appendToLog(file: string, message: MailMessage): void {
    // Chained so lines land in arrival order and never interleave.
    this.pendingWrite = this.pendingWrite
      .then(async () => {
        await mkdir(dirname(file), { recursive: true });
        await appendFile(file, `${JSON.stringify(message)}\n`);
      })
      .catch((error: unknown) => console.error('mail sink: could not append to log file', error));
  }
}

function isAddressedTo(message: MailMessage, recipient: string): boolean {
  return recipientsOf(message).includes(recipient.trim().toLowerCase());
}
