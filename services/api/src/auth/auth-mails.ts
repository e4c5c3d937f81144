import type { OutgoingMail } from '../mail/mail-sender';

function formatUtc(date: Date): string {
  return `${date.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}

export function invitationMail(
  to: string,
  displayName: string,
  invitedBy: string,
  url: string,
  expiresAt: Date,
): OutgoingMail {
  return {
    to,
    subject: 'You are invited to Tallyloom',
    text: [
      `Hello ${displayName},`,
      '',
      `${invitedBy} has invited you to Tallyloom, the reporting console of the blanket network.`,
      'Choose your password here to start:',
      '',
      url,
      '',
      `The link works once and until ${formatUtc(expiresAt)}.`,
      'If you did not expect this, you can ignore this e-mail.',
    ].join('\n'),
  };
}

export function passwordResetMail(
  to: string,
  displayName: string,
  url: string,
  expiresAt: Date,
): OutgoingMail {
  return {
    to,
    subject: 'Reset your Tallyloom password',
    text: [
      `Hello ${displayName},`,
      '',
      'Someone (we hope you) asked to reset the password of your Tallyloom account.',
      'Choose a new password here:',
      '',
      url,
      '',
      `The link works once and until ${formatUtc(expiresAt)}.`,
      'If you did not ask for this, ignore this e-mail: your password stays as it is.',
    ].join('\n'),
  };
}
