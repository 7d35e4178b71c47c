import 'server-only';
import { ROLE_LABELS, type Role } from '@/lib/roles';

export interface InvitationMailInput {
  name: string;
  role: Role;
  link: string;
  expiresAt: string; // as the site reads it
  invitedBy: string;
}

export function invitationMail({ name, role, link, expiresAt, invitedBy }: InvitationMailInput): { subject: string; text: string } {
  return {
    subject: 'You are invited to Tallyforge',
    text: [
      `Hello ${name},`,
      '',
      `${invitedBy} has added you to Tallyforge as ${ROLE_LABELS[role]}.`,
      'Choose your password with this one-time link:',
      '',
      link,
      '',
      `The link works once and expires ${expiresAt}.`,
      'If you did not expect this, ignore this message.',
    ].join('\n'),
  };
}
