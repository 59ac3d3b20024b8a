import request from 'supertest';
import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import type { MailCatcher } from '../../server/dev/mail-catcher';
import { createApp } from '../../server/app';
import { User, type Brewery } from '../../server/models';
import { createBrewery } from '../../server/services/auth';
import { hashPassword } from '../../server/services/passwords';
import type { Role } from '../../shared/schemas/roles';

/** A password the strength estimator accepts. */
export const GOOD_PASSWORD = 'slate-otter-windmill-45';

export function mailCatcher(): MailCatcher {
  const catcher = (globalThis as { mailCatcher?: MailCatcher }).mailCatcher;
  if (!catcher) throw new Error('tests/api/setup.ts did not start the mail catcher');
  return catcher;
}

let app: Express | undefined;
/** One app per test file (it holds the sign-in rate limiter's memory). */
export function testApp(): Express {
  app ??= createApp();
  return app;
}

/** A supertest agent that keeps cookies and sends the client header every write needs. */
export function agent(target: Express = testApp()) {
  const a = request.agent(target);
  a.set('x-kettlewright', '1');
  return a;
}

export type Agent = ReturnType<typeof agent>;

/** `name=value` of a Set-Cookie line, ready for a Cookie header. */
export function cookiePair(setCookie: string): string {
  const end = setCookie.indexOf(';');
  return end === -1 ? setCookie : setCookie.slice(0, end);
}

/** A response header a check relies on, or a failure that names it. */
export function headerOf(res: { headers: Record<string, string | undefined> }, name: string): string {
  const value = res.headers[name];
  if (value === undefined) throw new Error(`The response has no ${name} header`);
  return value;
}

/** The one row a check expects, or a failure that says how many there were. */
export function theOne<T>(rows: readonly T[], what: string): T {
  const [row] = rows;
  if (rows.length !== 1 || row === undefined) throw new Error(`Expected exactly one ${what}, found ${rows.length}`);
  return row;
}

/** The first group `pattern` captures in `text`, or a failure that shows the text. */
export function captured(text: string, pattern: RegExp): string {
  const value = pattern.exec(text)?.[1];
  if (value === undefined) throw new Error(`${pattern} found nothing in: ${text}`);
  return value;
}

const tag = () => randomBytes(5).toString('hex');

let cachedHash: string | undefined;

export interface TestBrewery {
  brewery: Brewery;
  users: Record<Role, User>;
  /** Signed-in agents per role. */
  as: Record<Role, Agent>;
}

/** A brewery with one person per role, each signed in through the API. */
export async function createTestBrewery(target: Express = testApp()): Promise<TestBrewery> {
  cachedHash ??= await hashPassword(GOOD_PASSWORD);
  const t = tag();
  const brewery = await createBrewery({ name: `Test brewery ${t}`, unitSystem: 'us', timeZone: 'UTC' });
  const users = {} as Record<Role, User>;
  const as = {} as Record<Role, Agent>;
  for (const role of ['head_brewer', 'assistant_brewer', 'taproom_manager'] as Role[]) {
    users[role] = await User.create({
      breweryId: brewery.id,
      email: `${role}.${t}@test.example`,
      displayName: `${role} ${t}`,
      role,
      passwordHash: cachedHash,
      disabledAt: null,
    });
    as[role] = agent(target);
    const res = await as[role].post('/api/auth/sign-in').send({ email: users[role].email, password: GOOD_PASSWORD });
    if (res.status !== 200) throw new Error(`sign-in failed for ${role}: ${res.status} ${JSON.stringify(res.body)}`);
  }
  return { brewery, users, as };
}
