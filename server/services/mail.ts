import nodemailer from 'nodemailer';
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

export function publicLink(path: string): string {
  return new URL(path, env.PUBLIC_URL).toString();
}
