import 'server-only';
import type { MailAttachment, OutgoingMail } from './mailer';

/** The words of each e-mail the app sends. Links carry the one-time token, nothing else secret. */

export function verificationMail(to: string, name: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Confirm your e-mail address for Rimscale',
    text: `Hello ${name},\n\nOpen this link to confirm your address (valid for 24 hours, once):\n\n${link}\n\nIf you did not sign up, ignore this message.\n`,
  };
}

export function resetMail(to: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Choose a new Rimscale password',
    text: `Someone asked to reset the password of the Rimscale account for this address.\n\nOpen this link to choose a new password (valid for 1 hour, once):\n\n${link}\n\nIf it was not you, ignore this message: the password stays as it is.\n`,
  };
}

export function invitationMail(to: string, inviter: string, workspace: string, role: string, link: string): OutgoingMail {
  return {
    to,
    subject: `${inviter} invites you to ${workspace} on Rimscale`,
    text: `${inviter} invites you to join ${workspace} on Rimscale as ${role}.\n\nOpen this link to accept (valid for 7 days, once). If you have no account yet, you can create one with this address on the way:\n\n${link}\n`,
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
