import 'server-only';
import { mailName } from '@/lib/text/mail-name';
import type { OutgoingMail } from './mailer';

/** The words of each e-mail the app sends. Links carry the one-time token, nothing else secret. */

export function verificationMail(to: string, name: string, link: string): OutgoingMail {
  const greeting = mailName(name);
  return {
    to,
    subject: 'Confirm your e-mail address for Rimscale',
    text: `${greeting ? `Hello ${greeting}` : 'Hello'},\n\nOpen this link to confirm your address (valid for 24 hours, once):\n\n${link}\n\nIf you did not sign up, ignore this message.\n`,
  };
}

export function resetMail(to: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Choose a new Rimscale password',
    text: `Someone asked to reset the password of the Rimscale account for this address.\n\nOpen this link to choose a new password (valid for 1 hour, once):\n\n${link}\n\nIf it was not you, ignore this message: the password stays as it is.\n`,
  };
}

export function invitationMail(to: string, inviterName: string, workspaceName: string, role: string, link: string): OutgoingMail {
  const inviter = mailName(inviterName) ?? 'A Rimscale user';
  const workspace = mailName(workspaceName) ?? 'a shop';
  return {
    to,
    subject: `${inviter} invites you to ${workspace} on Rimscale`,
    text: `${inviter} invites you to join ${workspace} on Rimscale as ${role}.\n\nOpen this link to accept (valid for 7 days, once). If you have no account yet, you can create one with this address on the way:\n\n${link}\n`,
  };
}
