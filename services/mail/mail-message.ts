import type { AddressObject, ParsedMail } from 'mailparser';

// What the sink keeps of each received e-mail: the parsed headers and bodies the app's tests
// look at, the SMTP envelope (the only place Bcc recipients show up), and the raw source.

export interface MailAddress {
  address: string;
  name: string;
}

export interface MailAttachment {
  index: number;
  filename: string | null;
  contentType: string;
  size: number;
  contentId: string | null;
  checksum: string;
}

export interface MailMessage {
  id: string;
  receivedAt: string;
  envelope: { from: string | null; to: string[] };
  messageId: string | null;
  date: string | null;
  subject: string;
  from: MailAddress[];
  to: MailAddress[];
  cc: MailAddress[];
  replyTo: MailAddress[];
  text: string | null;
  html: string | null;
  attachments: MailAttachment[];
}

/** The message plus what is too bulky for list answers: raw source and attachment bytes. */
export interface StoredMail {
  message: MailMessage;
  raw: Buffer;
  attachmentContents: Buffer[];
}

export function toMailMessage(
  parsed: ParsedMail,
  meta: { id: string; receivedAt: Date; envelope: MailMessage['envelope'] },
): MailMessage {
  return {
    id: meta.id,
    receivedAt: meta.receivedAt.toISOString(),
    envelope: meta.envelope,
    messageId: parsed.messageId ?? null,
    date: parsed.date?.toISOString() ?? null,
    subject: parsed.subject ?? '',
    from: addresses(parsed.from),
    to: addresses(parsed.to),
    cc: addresses(parsed.cc),
    replyTo: addresses(parsed.replyTo),
    text: parsed.text ?? null,
    // mailparser gives `false` when there is no HTML part.
    html: parsed.html === false ? null : (parsed.html ?? null),
    attachments: parsed.attachments.map((attachment, index) => ({
      index,
      filename: attachment.filename ?? null,
      contentType: attachment.contentType,
      size: attachment.size,
      contentId: attachment.contentId ?? null,
      checksum: attachment.checksum,
    })),
  };
}

function addresses(field: AddressObject | AddressObject[] | undefined): MailAddress[] {
  const groups = field === undefined ? [] : Array.isArray(field) ? field : [field];
  // Group syntax ("Inspectors: a@x, b@x;") nests addresses one level down.
  return groups
    .flatMap((group) => group.value)
    .flatMap((entry) => (entry.group ? entry.group : [entry]))
    .map((entry) => ({ address: entry.address ?? '', name: entry.name }));
}

/** Everyone the message was sent to: visible To/Cc plus envelope recipients (Bcc included). */
export function recipientsOf(message: MailMessage): string[] {
  return [...message.to, ...message.cc]
    .map((entry) => entry.address)
    .concat(message.envelope.to)
    .map((address) => address.toLowerCase());
}
