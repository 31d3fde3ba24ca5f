import { describe, expect, it } from 'vitest';
import { MAIL_TEMPLATES, renderTemplate, type MailTemplateData, type MailTemplateName } from '.';

const HOSTILE = '<script>alert("x")</script> & Söhne';
const LINK = 'https://app.waygrade.example/confirm-email?token=abc&next=1';
const MACHINE = { maker: 'Harlow', model: 'Turnmaster 280', serialNumber: 'HT-1182' };
const WHEN = new Date('2026-03-04T08:30:00Z');

/** One sample per template, each carrying a hostile name so escaping is checked everywhere. */
const SAMPLES: { [N in MailTemplateName]: { data: MailTemplateData<N>; mustSay: string[] } } = {
  'verify-email': { data: { name: HOSTILE, url: LINK, expiresInHours: 48 }, mustSay: ['48 hours'] },
  'reset-password': { data: { name: HOSTILE, url: LINK, expiresInMinutes: 60 }, mustSay: ['60 minutes', 'signs you out'] },
  invitation: {
    data: { name: HOSTILE, role: 'inspector', invitedBy: 'Nadia Ferrand', url: LINK, expiresInDays: 7 },
    mustSay: ['Nadia Ferrand', 'inspector', '7 days'],
  },
  'account-exists': { data: { name: HOSTILE, signInUrl: 'https://app.waygrade.example/sign-in', resetUrl: LINK }, mustSay: ['already has an account'] },
  'inspection-booked': {
    data: {
      recipientName: HOSTILE,
      audience: 'seller',
      machine: MACHINE,
      scheduledAt: WHEN,
      site: { town: 'Lowmere', region: 'Brenmark', contactName: 'Ines Harrow', contactPhone: '+00 555 0101', accessNotes: 'Gate B' },
      inspectorName: 'Ilse Marwick',
      url: LINK,
    },
    mustSay: ['Harlow Turnmaster 280 (serial HT-1182)', '4 Mar 2026', '08:30 UTC', 'Lowmere, Brenmark', 'Ilse Marwick', 'Gate B'],
  },
  'inspection-cancelled': {
    data: { recipientName: HOSTILE, audience: 'inspector', machine: MACHINE, scheduledAt: WHEN, reason: 'Machine sold privately', cancelledBy: 'Gwen Albright', url: LINK },
    mustSay: ['cancelled', 'Machine sold privately', '4 Mar 2026'],
  },
  'survey-returned': {
    data: { inspectorName: HOSTILE, machine: MACHINE, coordinatorName: 'Nadia Ferrand', comment: 'Repeat the level run with the stand unloaded', correction: false, url: LINK },
    mustSay: ['sent the survey', 'Repeat the level run'],
  },
  'survey-submitted': {
    data: { coordinatorName: HOSTILE, machine: MACHINE, inspectorName: 'Ilse Marwick', submittedAt: WHEN, findingsOutOfTolerance: 3, url: LINK },
    mustSay: ['Ilse Marwick', 'Readings outside tolerance'],
  },
  'report-released': {
    data: { recipientName: HOSTILE, audience: 'earlier-buyer', machine: MACHINE, reportCode: 'WG-7K3P-Q9XD-4MRT', version: 2, overallCondition: 'Good', url: LINK },
    mustSay: ['WG-7K3P-Q9XD-4MRT', 'supersedes', 'no charge'],
  },
  'payment-receipt': {
    data: { recipientName: HOSTILE, receiptNumber: 'R-2026-0042', machine: MACHINE, reportCode: 'WG-7K3P-Q9XD-4MRT', amountMinor: 18950, currency: 'EUR', paidAt: WHEN, url: LINK },
    mustSay: ['R-2026-0042', '€189.50'],
  },
  refund: {
    data: { recipientName: HOSTILE, receiptNumber: 'R-2026-0042', machine: MACHINE, reportCode: null, amountMinor: 18900, currency: 'EUR', refundedAt: WHEN, reason: 'Inspection cancelled' },
    mustSay: ['€189', 'Inspection cancelled'],
  },
  'reinspection-paid': {
    data: { recipientName: HOSTILE, receiptNumber: 'WGR-000042', machine: MACHINE, amountMinor: 39_000, currency: 'EUR', paidAt: WHEN, url: LINK },
    mustSay: ['WGR-000042', '€390', 'Re-inspection', 'refunded to you automatically', 'Once the visit has started there is no automatic refund'],
  },
  'reinspection-report-ready': {
    data: { recipientName: HOSTILE, machine: MACHINE, reportCode: 'WG-7K3P-Q9XD-4MRT', overallCondition: 'Fair', url: LINK },
    mustSay: ['WG-7K3P-Q9XD-4MRT', 'no further charge', 'Fair'],
  },
};

describe('the mail templates', () => {
  it('has a sample for every template', () => {
    expect(Object.keys(SAMPLES).sort()).toEqual(Object.keys(MAIL_TEMPLATES).sort());
  });

  for (const name of Object.keys(SAMPLES) as MailTemplateName[]) {
    describe(name, () => {
      const sample = SAMPLES[name];
      const mail = renderTemplate(name, sample.data as never);

      it('says the same things in text and HTML', () => {
        expect(mail.subject.length).toBeGreaterThan(10);
        for (const phrase of sample.mustSay) {
          expect(mail.text).toContain(phrase);
          expect(mail.html).toContain(phrase.replaceAll('&', '&amp;'));
        }
      });

      it('escapes names in the HTML and keeps them readable in the text', () => {
        expect(mail.html).not.toContain('<script>');
        expect(mail.html).toContain('&lt;script&gt;');
        expect(mail.text).toContain('Hello <script>alert("x")</script>,');
      });

      it('names Waygrade and no other product', () => {
        expect(mail.text).toContain('Waygrade');
      });
    });
  }

  it('carries the action link whole, with its query string escaped only in HTML', () => {
    const mail = renderTemplate('verify-email', SAMPLES['verify-email'].data);
    expect(mail.text).toContain(LINK);
    expect(mail.html).toContain('href="https://app.waygrade.example/confirm-email?token=abc&amp;next=1"');
  });

  it('greets without a name when none is known', () => {
    const mail = renderTemplate('reset-password', { name: null, url: LINK, expiresInMinutes: 60 });
    expect(mail.text.startsWith('Hello,\n')).toBe(true);
  });
});
