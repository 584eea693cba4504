import type { OutgoingMail } from '../mail.service';

const SIGNATURE = '\n\n-- \nKeenroute (demo business: the people and places in this demo are invented)';

export function invitationMail(to: string, name: string, invitedBy: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'You are invited to Keenroute',
    text:
      `Hello ${name},\n\n${invitedBy} has invited you to Keenroute. Set your password here ` +
      `(the link works once and expires in 72 hours):\n\n${link}` +
      SIGNATURE,
  };
}

export function passwordResetMail(to: string, name: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Reset your Keenroute password',
    text:
      `Hello ${name},\n\nSomeone asked to reset the password of this Keenroute account. If it was you, choose a new ` +
      `password here (the link works once and expires in 1 hour):\n\n${link}\n\nIf it was not you, ignore this message.` +
      SIGNATURE,
  };
}
