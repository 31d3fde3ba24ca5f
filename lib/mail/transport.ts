import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { env } from '@/lib/env';

let cached: { url: string; transporter: Transporter } | undefined;

/** One pooled SMTP connection set per process, made from SMTP_URL; null when mail is not configured. */
export function mailTransport(): Transporter | null {
  const url = env().SMTP_URL;
  if (!url) return null;
  if (cached?.url !== url) {
    cached = { url, transporter: nodemailer.createTransport(url, { from: env().MAIL_FROM }) };
  }
  return cached.transporter;
}
