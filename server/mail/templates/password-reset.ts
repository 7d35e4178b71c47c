import 'server-only';

export interface PasswordResetMailInput {
  name: string;
  link: string;
  expiresAt: string; // as the site reads it
  sentBy: string;
}

// For someone who already has a password: their old one keeps working until they use the link.
export function passwordResetMail({ name, link, expiresAt, sentBy }: PasswordResetMailInput): { subject: string; text: string } {
  return {
    subject: 'Choose a new Tallyforge password',
    text: [
      `Hello ${name},`,
      '',
      `${sentBy} sent you a link to choose a new password for Tallyforge.`,
      'Your current password keeps working until you use it:',
      '',
      link,
      '',
      `The link works once and expires ${expiresAt}. Using it signs you out on every other device.`,
      'If you did not ask for this, ignore this message and tell your administrator.',
    ].join('\n'),
  };
}
