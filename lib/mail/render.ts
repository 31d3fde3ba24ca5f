import { escapeHtml } from './html';

/** What every Waygrade e-mail says, in one shape, so text and HTML always carry the same words. */
export type MailContent = {
  subject: string;
  greeting: string;
  paragraphs: readonly string[];
  /** Label/value lines, e.g. machine, date, site. */
  facts?: ReadonlyArray<readonly [label: string, value: string]>;
  action?: { label: string; url: string };
  /** A last word: why the mail came, what to do if it was not expected. */
  footnote?: string;
};

export type RenderedMail = { subject: string; text: string; html: string };

// Colours from tailwind.config.ts: paper, graphite ink, copper accent. Mail clients need them inline.
const PAPER = '#f7f5f0';
const INK = '#1f2a30';
const INK_SOFT = '#46545c';
const COPPER = '#a4481f';
const LINE = '#d9d4c8';
const FONT = "'Work Sans', 'Segoe UI', Helvetica, Arial, sans-serif";

function renderText(content: MailContent): string {
  const lines = [content.greeting, '', ...content.paragraphs.flatMap((p) => [p, ''])];
  if (content.facts?.length) {
    const width = Math.max(...content.facts.map(([label]) => label.length));
    for (const [label, value] of content.facts) lines.push(`${`${label}:`.padEnd(width + 2)}${value}`);
    lines.push('');
  }
  if (content.action) lines.push(`${content.action.label}:`, content.action.url, '');
  if (content.footnote) lines.push(content.footnote, '');
  lines.push('— Waygrade, measured condition reports for used machine tools');
  return lines.join('\n');
}

function renderHtml(content: MailContent): string {
  const paragraphs = content.paragraphs
    .map((p) => `<p style="margin:0 0 16px;line-height:1.55">${escapeHtml(p)}</p>`)
    .join('');
  const facts = content.facts?.length
    ? `<table role="presentation" style="border-collapse:collapse;margin:0 0 20px;width:100%">${content.facts
        .map(
          ([label, value]) =>
            `<tr><td style="padding:6px 12px 6px 0;border-top:1px solid ${LINE};color:${INK_SOFT};white-space:nowrap;vertical-align:top">${escapeHtml(label)}</td><td style="padding:6px 0;border-top:1px solid ${LINE};font-weight:600">${escapeHtml(value)}</td></tr>`,
        )
        .join('')}</table>`
    : '';
  const action = content.action
    ? `<p style="margin:8px 0 24px"><a href="${escapeHtml(content.action.url)}" style="display:inline-block;background:${COPPER};color:#ffffff;text-decoration:none;font-weight:600;padding:12px 22px;border-radius:8px">${escapeHtml(content.action.label)}</a></p><p style="margin:0 0 20px;font-size:13px;color:${INK_SOFT}">If the button does not work, copy this address into your browser:<br><span style="word-break:break-all">${escapeHtml(content.action.url)}</span></p>`
    : '';
  const footnote = content.footnote ? `<p style="margin:0 0 16px;font-size:14px;color:${INK_SOFT}">${escapeHtml(content.footnote)}</p>` : '';
  return [
    '<!doctype html><html lang="en"><head><meta charset="utf-8">',
    `<title>${escapeHtml(content.subject)}</title></head>`,
    `<body style="margin:0;padding:24px 12px;background:${PAPER};color:${INK};font-family:${FONT};font-size:16px">`,
    `<div style="max-width:560px;margin:0 auto;background:#ffffff;border:1px solid ${LINE};border-radius:12px;padding:28px">`,
    `<p style="margin:0 0 24px;font-size:20px;font-weight:600;color:${INK}"><span style="color:${COPPER}">&#9644;</span> Waygrade</p>`,
    `<p style="margin:0 0 16px;line-height:1.55">${escapeHtml(content.greeting)}</p>`,
    paragraphs,
    facts,
    action,
    footnote,
    `<p style="margin:24px 0 0;padding-top:16px;border-top:1px solid ${LINE};font-size:13px;color:${INK_SOFT}">Waygrade — measured condition reports for used machine tools</p>`,
    '</div></body></html>',
  ].join('');
}

export function renderMail(content: MailContent): RenderedMail {
  return { subject: content.subject, text: renderText(content), html: renderHtml(content) };
}

/** "Dear Hana," or a neutral greeting when no name is known. */
export function greet(name: string | null | undefined) {
  const first = name?.trim().split(/\s+/)[0];
  return first ? `Hello ${first},` : 'Hello,';
}
