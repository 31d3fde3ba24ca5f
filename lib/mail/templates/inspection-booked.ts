import { greet, renderMail } from '../render';
import { machineName, mailDateTime, type MachineSummary } from '../mail-format';

export type InspectionBookedData = {
  recipientName: string | null;
  /** The seller hears when to expect the visit; the inspector hears where to go. */
  audience: 'seller' | 'inspector';
  machine: MachineSummary;
  scheduledAt: Date;
  site: { town: string; region?: string | null; accessNotes?: string | null; contactName?: string | null; contactPhone?: string | null };
  inspectorName: string;
  /** The inspection's page in Waygrade. */
  url: string;
  /** True when an earlier booking was moved. */
  rescheduled?: boolean;
};

export function inspectionBooked(data: InspectionBookedData) {
  const what = machineName(data.machine);
  const when = mailDateTime(data.scheduledAt);
  const where = data.site.region ? `${data.site.town}, ${data.site.region}` : data.site.town;
  const facts: Array<readonly [string, string]> = [
    ['Machine', what],
    ['Date and time', when],
    ['Site', where],
    ['Inspector', data.inspectorName],
  ];
  if (data.site.contactName) facts.push(['Site contact', [data.site.contactName, data.site.contactPhone].filter(Boolean).join(', ')]);
  if (data.site.accessNotes) facts.push(['Access', data.site.accessNotes]);
  const verb = data.rescheduled ? 'moved' : 'booked';
  const paragraphs =
    data.audience === 'seller'
      ? [
          `The inspection of your ${what} is ${verb} for ${when}.`,
          'Please have the machine clean, under power and free to run, with its chuck, tailstock and steadies to hand. The inspector needs about three hours and a short test cut.',
        ]
      : [
          `You are assigned to inspect the ${what} on ${when}.`,
          'The survey is ready in Waygrade on your phone. Follow the site’s safety rules, the maker’s instructions and local codes for any electrical check.',
        ];
  return renderMail({
    subject: `Inspection ${verb}: ${data.machine.maker} ${data.machine.model}, ${when}`,
    greeting: greet(data.recipientName),
    paragraphs,
    facts,
    action: { label: 'Open the inspection', url: data.url },
  });
}
