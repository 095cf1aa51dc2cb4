import 'server-only';
import { siteUrl } from '@/lib/site';
import type { Message } from './transport';

const sign = '\n\n— Clackwater\nIf you did not ask for this, you can ignore this message.';

export function verifyEmailMessage(to: string, name: string, token: string): Message {
  const link = `${siteUrl()}/verify-email?token=${token}`;
  return {
    to,
    subject: 'Confirm your e-mail for Clackwater',
    text: `Hello ${name},\n\nConfirm your e-mail address to finish signing up:\n${link}\n\nThe link works once and lasts 48 hours.${sign}`,
  };
}

export function resetPasswordMessage(to: string, name: string, token: string): Message {
  const link = `${siteUrl()}/reset-password/new?token=${token}`;
  return {
    to,
    subject: 'Reset your Clackwater password',
    text: `Hello ${name},\n\nChoose a new password here:\n${link}\n\nThe link works once and lasts one hour.${sign}`,
  };
}

/** `link` is next-auth's callback URL, carrying its own single-use token. */
export function signInLinkMessage(to: string, name: string, link: string): Message {
  return {
    to,
    subject: 'Your Clackwater sign-in link',
    text: `Hello ${name},\n\nSign in to Clackwater with this link:\n${link}\n\nIt works once and lasts 15 minutes.${sign}`,
  };
}
