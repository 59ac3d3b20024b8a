import { Router } from 'express';
import { env } from '../config/env';
import { readCaughtMail } from './mail-catcher';

/** Development only: the mail the local catcher received, so a developer can follow invite and reset links. */
export const devMailRouter = Router();

devMailRouter.get('/', (_req, res) => {
  const mail = env.MAIL_DIR ? readCaughtMail(env.MAIL_DIR) : [];
  const escape = (s: string) =>
    s.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);
  const items = mail
    .map(
      (m) =>
        `<article><h2>${escape(m.subject)}</h2><p>To ${escape(m.to)} · ${escape(m.receivedAt)}</p><pre>${escape(m.text)}</pre></article>`,
    )
    .join('');
  res
    .type('html')
    .send(
      `<!doctype html><meta charset="utf-8"><title>Development mail</title><style>body{font:16px system-ui;max-width:50rem;margin:2rem auto}pre{white-space:pre-wrap;background:#eef;padding:1rem}</style><h1>Mail received by the local catcher</h1>${items || '<p>No mail yet.</p>'}`,
    );
});
