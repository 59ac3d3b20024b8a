// A local stand-in for a hosted SMTP service, used in development and tests: nodemailer really talks SMTP to it.
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import { mkdirSync, writeFileSync, readdirSync, readFileSync, existsSync } from 'node:fs';
import path from 'node:path';

/** Mail to this domain is refused (550, as for a mailbox that does not exist), so a failed send can be seen. */
export const UNDELIVERABLE_DOMAIN = 'undeliverable.example';

export interface CaughtMail {
  id: string;
  to: string;
  subject: string;
  text: string;
  receivedAt: string;
}

export interface MailCatcher {
  port: number;
  url: string;
  messages(): CaughtMail[];
  /** The first message (caught already or arriving later) that `match` accepts; rejects after `timeoutMs`. */
  waitFor(match: (mail: CaughtMail) => boolean, timeoutMs?: number): Promise<CaughtMail>;
  close(): Promise<void>;
}

/** Starts the catcher on loopback; messages are kept in memory and, when `dir` is given, as JSON files. */
export function startMailCatcher(port: number, dir?: string): Promise<MailCatcher> {
  const received: CaughtMail[] = [];
  const waiting = new Set<(mail: CaughtMail) => void>();
  if (dir) mkdirSync(dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onRcptTo(address, _session, callback) {
      if (address.address.toLowerCase().endsWith(`@${UNDELIVERABLE_DOMAIN}`)) {
        return callback(Object.assign(new Error('No such mailbox'), { responseCode: 550 }));
      }
      callback();
    },
    onData(stream, _session, callback) {
      simpleParser(stream).then(
        (parsed) => {
          const toField = Array.isArray(parsed.to) ? parsed.to[0] : parsed.to;
          const mail: CaughtMail = {
            id: `${Date.now()}-${received.length}`,
            to: toField?.text ?? '',
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            receivedAt: new Date().toISOString(),
          };
          received.push(mail);
          for (const notify of waiting) notify(mail);
          if (dir) writeFileSync(path.join(dir, `${mail.id}.json`), JSON.stringify(mail, null, 2));
          callback();
        },
        (err: Error) => callback(err),
      );
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      const address = server.server.address();
      const actualPort = typeof address === 'object' && address ? address.port : port;
      resolve({
        port: actualPort,
        url: `smtp://127.0.0.1:${actualPort}`,
        messages: () => [...received],
        waitFor: (match, timeoutMs = 5000) => {
          const caught = received.find(match);
          if (caught) return Promise.resolve(caught);
          return new Promise((resolveMail, rejectMail) => {
            const notify = (mail: CaughtMail) => {
              if (!match(mail)) return;
              clearTimeout(timer);
              waiting.delete(notify);
              resolveMail(mail);
            };
            const timer = setTimeout(() => {
              waiting.delete(notify);
              const subjects = received.map((m) => `"${m.subject}" to ${m.to}`).join('; ') || 'none';
              rejectMail(new Error(`No matching e-mail arrived within ${timeoutMs} ms (caught so far: ${subjects})`));
            }, timeoutMs);
            waiting.add(notify);
          });
        },
        close: () => new Promise((r) => server.close(() => r())),
      });
    });
  });
}

/** Messages a catcher wrote to a folder, newest first (for the development mail page). */
export function readCaughtMail(dir: string): CaughtMail[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir)
    .filter((f) => f.endsWith('.json'))
    .map((f) => JSON.parse(readFileSync(path.join(dir, f), 'utf8')) as CaughtMail)
    .sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
}
