import nodemailer from 'nodemailer';
import type { Logger } from 'pino';
import { env } from '../config/env';

const transport = nodemailer.createTransport(env.SMTP_URL);

export interface Mail {
  to: string;
  subject: string;
  text: string;
}

/** Sends one e-mail through the configured SMTP server (a local catcher in development and tests). */
export async function sendMail(mail: Mail): Promise<void> {
  await transport.sendMail({ from: env.MAIL_FROM, ...mail });
}

/**
 * Sends one e-mail without holding up the answer, for requests whose timing must not reveal whether a mail
 * went out (a reset request for a known address would otherwise answer slower than for an unknown one).
 * A failure is logged; the caller has already answered and cannot report it.
 */
export function sendMailInBackground(mail: Mail, log: Logger): void {
  sendMail(mail).catch((err: unknown) => log.error({ err, subject: mail.subject }, 'e-mail could not be sent'));
}

export function publicLink(path: string): string {
  return new URL(path, env.PUBLIC_URL).toString();
}
