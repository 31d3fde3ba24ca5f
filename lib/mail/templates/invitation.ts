import { greet, renderMail } from '../render';

export type InvitationData = {
  name: string | null;
  role: 'inspector' | 'admin';
  invitedBy: string;
  url: string;
  expiresInDays: number;
};

const ROLE_WORK: Record<InvitationData['role'], string> = {
  inspector: 'As an inspector you will see the inspections assigned to you and record each survey on your phone at the machine.',
  admin: 'As a coordinator you will book inspections, assign inspectors, review surveys and release reports.',
};

export function invitation(data: InvitationData) {
  return renderMail({
    subject: `${data.invitedBy} invited you to Waygrade`,
    greeting: greet(data.name),
    paragraphs: [
      `${data.invitedBy} has set up a Waygrade account for you. ${ROLE_WORK[data.role]}`,
      `Choose your password with the link below to start. The link works once and for ${data.expiresInDays} days.`,
    ],
    action: { label: 'Choose my password', url: data.url },
    footnote: 'If you were not expecting this, ignore this mail and the account stays unused.',
  });
}
