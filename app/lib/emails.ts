import 'server-only';
import { formatDateTime, type DateFormat } from '@/lib/format/date-format';
import { mailName } from '@/lib/text/mail-name';
import type { MailAttachment, OutgoingMail } from './mailer';

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

/** `expiresAt` is written in the inviter's date format (DEVELOPERS.md, "Dates"): the invitee's is not known yet. */
export function invitationMail(
  to: string,
  invitation: { inviter: string; workspace: string; role: string; link: string; expiresAt: string },
  dateFormat: DateFormat,
): OutgoingMail {
  const { role, link, expiresAt } = invitation;
  const inviter = mailName(invitation.inviter) ?? 'A Rimscale user';
  const workspace = mailName(invitation.workspace) ?? 'a shop';
  return {
    to,
    subject: `${inviter} invites you to ${workspace} on Rimscale`,
    text: `${inviter} invites you to join ${workspace} on Rimscale as ${role}.\n\nOpen this link to accept (valid for 7 days, until ${formatDateTime(expiresAt, dateFormat)}, once). If you have no account yet, you can create one with this address on the way:\n\n${link}\n`,
  };
}

export function customerCopyMail(to: string, copy: { shopName: string; customerName: string; engine: string; technician: string }, pdf: MailAttachment): OutgoingMail {
  return {
    to,
    subject: `${copy.shopName}: the timing record of your engine`,
    text: `Hello ${copy.customerName},\n\nAttached is the timing record of your engine (${copy.engine}) from ${copy.shopName}: top dead centre, the ignition timing as set and the port timing as measured${copy.technician ? `, by ${copy.technician}` : ''}.\n\nKeep it with the engine's papers. The engine maker's manual and local regulations come first.\n\n${copy.shopName}\n`,
    attachments: [pdf],
  };
}
