// The two messages that carry a secret link: an invitation and a password reset. They go straight
// to SMTP rather than through mail_outbox, whose rows are kept for the record: a live link must not
// sit in the database in the clear (the invitation keeps only its hash).
import { roleLabels, type Role } from '../../shared/roles';
import type { OutgoingMail } from '../mail/mailer';

export function invitationLink(publicUrl: string, token: string): string {
  return `${publicUrl.replace(/\/$/, '')}/accept-invitation?token=${encodeURIComponent(token)}`;
}

export function resetLink(publicUrl: string, token: string): string {
  return `${publicUrl.replace(/\/$/, '')}/reset-password?token=${encodeURIComponent(token)}`;
}

const dateFormat = new Intl.DateTimeFormat('en-US', { dateStyle: 'long', timeStyle: 'short', timeZone: 'UTC' });

export function invitationMail(input: {
  to: string;
  name: string;
  role: Role;
  organization: string | null;
  projects: string[];
  invitedBy: string;
  link: string;
  expiresAt: Date;
}): OutgoingMail {
  const desk = `${roleLabels[input.role]}${input.organization ? `, ${input.organization}` : ''}`;
  const projects = input.projects.length ? `Projects: ${input.projects.join('; ')}.` : 'An administrator will add you to your projects.';
  return {
    to: input.to,
    subject: 'You are invited to Spanrelay',
    text: [
      `${input.name},`,
      '',
      `${input.invitedBy} has invited you to Spanrelay as ${desk}.`,
      projects,
      '',
      `Choose your password here. The link works once, until ${dateFormat.format(input.expiresAt)} UTC:`,
      input.link,
      '',
      'If you did not expect this invitation, ignore this message; no account is made until the link is used.',
    ].join('\n'),
  };
}

export function passwordResetMail(input: { to: string; name: string; link: string; validMinutes: number }): OutgoingMail {
  return {
    to: input.to,
    subject: 'Reset your Spanrelay password',
    text: [
      `${input.name},`,
      '',
      `Someone asked to reset the password of your Spanrelay account. To choose a new one, open this link within ${input.validMinutes} minutes; it works once:`,
      input.link,
      '',
      'If it was not you, ignore this message: your password stays as it is.',
    ].join('\n'),
  };
}
