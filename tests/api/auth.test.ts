// Foundation: sign-in, sign-out, sessions (cookie, fixation, restart), password change and reset by e-mail.
import { createHmac, randomBytes } from 'node:crypto';
import request, { type Response } from 'supertest';
import { pino } from 'pino';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { createApp } from '../../server/app';
import { SESSION_COOKIE, SESSION_IDLE_MS } from '../../server/middlewares/session';
import { env } from '../../server/config/env';
import { UNDELIVERABLE_DOMAIN } from '../../server/dev/mail-catcher';
import { hashToken } from '../../server/services/tokens';
import { AuditEvent, Invite, Session, User } from '../../server/models';
import {
  GOOD_PASSWORD,
  agent,
  captured,
  cookiePair,
  createTestBrewery,
  mailCatcher,
  testApp,
  theOne,
  type TestBrewery,
} from './helpers';

const NEW_PASSWORD = 'harbour-lantern-quince-81';

/** The session cookie a response sets, as the whole Set-Cookie line. */
function sessionSetCookie(res: Response): string | undefined {
  const lines = (res.headers['set-cookie'] as unknown as string[] | undefined) ?? [];
  return lines.find((line) => line.startsWith(`${SESSION_COOKIE}=`));
}

/** The session id inside a signed cookie (`s:<sid>.<signature>`). */
function sidOf(setCookie: string): string {
  const value = decodeURIComponent(cookiePair(setCookie).slice(SESSION_COOKIE.length + 1));
  return value.slice(2, value.lastIndexOf('.'));
}

async function signIn(target: ReturnType<typeof createApp>, email: string, password: string, cookie?: string) {
  const req = request(target).post('/api/auth/sign-in').set('x-kettlewright', '1');
  if (cookie) req.set('Cookie', cookie);
  return req.send({ email, password });
}

/** A user of the brewery with GOOD_PASSWORD, not yet signed in anywhere. */
async function newUser(t: TestBrewery, role: User['role'] = 'assistant_brewer'): Promise<User> {
  const tag = randomBytes(4).toString('hex');
  return User.create({
    breweryId: t.brewery.id,
    email: `person.${tag}@test.example`,
    displayName: `Person ${tag}`,
    role,
    passwordHash: t.users.head_brewer.passwordHash,
    disabledAt: null,
  });
}

let t: TestBrewery;
beforeAll(async () => {
  t = await createTestBrewery();
});

describe('sign-in and sign-out', () => {
  it('sign-in sets an httpOnly, SameSite=Lax session cookie and /api/auth/me answers the person', async () => {
    const user = await newUser(t);
    const res = await signIn(testApp(), user.email, GOOD_PASSWORD);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      id: user.id,
      email: user.email,
      role: 'assistant_brewer',
      brewery: { id: t.brewery.id },
    });
    expect(res.body).not.toHaveProperty('passwordHash');
    const setCookie = sessionSetCookie(res);
    expect(setCookie).toBeDefined();
    expect(setCookie).toMatch(/;\s*HttpOnly/i);
    expect(setCookie).toMatch(/;\s*SameSite=Lax/i);
    expect(setCookie).toMatch(/;\s*Path=\//i);

    const me = await request(testApp()).get('/api/auth/me').set('Cookie', cookiePair(setCookie!));
    expect(me.status).toBe(200);
    expect(me.body.email).toBe(user.email);
  });

  it('signed out, /api/auth/me answers 401 with the error shape', async () => {
    const res = await agent().get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error).toMatchObject({ code: 'unauthenticated', message: expect.any(String) });
  });

  it('sign-out ends the session on the server: the same cookie replayed afterwards gets 401 and its row is gone', async () => {
    const user = await newUser(t);
    const setCookie = sessionSetCookie(await signIn(testApp(), user.email, GOOD_PASSWORD))!;
    const cookie = cookiePair(setCookie);
    expect(await Session.findByPk(sidOf(setCookie))).not.toBeNull();

    const out = await request(testApp()).post('/api/auth/sign-out').set('x-kettlewright', '1').set('Cookie', cookie);
    expect(out.status).toBe(204);

    const me = await request(testApp()).get('/api/auth/me').set('Cookie', cookie);
    expect(me.status).toBe(401);
    expect(await Session.findByPk(sidOf(setCookie))).toBeNull();
    const audit = await AuditEvent.findOne({ where: { action: 'sign-out', userId: user.id } });
    expect(audit).not.toBeNull();
  });

  it('sign-in issues a new session id: a session planted before sign-in is not the one after (session fixation)', async () => {
    // An attacker's pre-sign-in session: a real row in the store and a correctly signed cookie for it.
    const plantedSid = randomBytes(24).toString('base64url');
    const expires = new Date(Date.now() + SESSION_IDLE_MS);
    await Session.create({
      sid: plantedSid,
      userId: null,
      expires,
      data: JSON.stringify({
        cookie: {
          originalMaxAge: SESSION_IDLE_MS,
          expires: expires.toISOString(),
          httpOnly: true,
          path: '/',
          sameSite: 'lax',
        },
      }),
    });
    const signature = createHmac('sha256', env.SESSION_SECRET).update(plantedSid).digest('base64').replace(/=+$/, '');
    const planted = `${SESSION_COOKIE}=${encodeURIComponent(`s:${plantedSid}.${signature}`)}`;

    const before = await request(testApp()).get('/api/auth/me').set('Cookie', planted);
    expect(before.status).toBe(401);
    expect(await Session.findByPk(plantedSid)).not.toBeNull();

    const user = await newUser(t);
    const res = await signIn(testApp(), user.email, GOOD_PASSWORD, planted);
    expect(res.status).toBe(200);
    const after = sessionSetCookie(res)!;
    expect(sidOf(after)).not.toBe(plantedSid);

    // The planted cookie does not carry the victim's identity. Its row is gone: sign-in regenerated the very
    // session the planted cookie named, which proves the server had adopted it (otherwise this test would prove nothing).
    expect((await request(testApp()).get('/api/auth/me').set('Cookie', planted)).status).toBe(401);
    expect(await Session.findByPk(plantedSid)).toBeNull();
    expect((await request(testApp()).get('/api/auth/me').set('Cookie', cookiePair(after))).status).toBe(200);
  });

  it('a wrong password and an unknown e-mail answer the same 401', async () => {
    const fresh = createApp(); // its own sign-in limiter: these failures do not count against the file's app
    const user = await newUser(t);
    const wrong = await signIn(fresh, user.email, 'not-the-password-at-all');
    const unknown = await signIn(fresh, `nobody.${randomBytes(4).toString('hex')}@test.example`, GOOD_PASSWORD);
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
    expect(sessionSetCookie(wrong)).toBeUndefined();
  });
});

describe('sessions are stored in MariaDB', () => {
  it('a session survives a server restart: a fresh app on the same database accepts the cookie', async () => {
    const user = await newUser(t);
    const appA = createApp();
    const setCookie = sessionSetCookie(await signIn(appA, user.email, GOOD_PASSWORD))!;

    const row = await Session.findByPk(sidOf(setCookie));
    expect(row).not.toBeNull();
    expect(row!.userId).toBe(user.id);
    expect(row!.expires!.getTime()).toBeGreaterThan(Date.now());

    const appB = createApp();
    const me = await request(appB).get('/api/auth/me').set('Cookie', cookiePair(setCookie));
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({ id: user.id, email: user.email });
  });

  it('a session ends 24 hours after sign-in however busy it has been (absolute timeout)', async () => {
    const user = await newUser(t);
    const setCookie = sessionSetCookie(await signIn(testApp(), user.email, GOOD_PASSWORD))!;
    const sid = sidOf(setCookie);
    const signedInHoursAgo = async (hours: number) => {
      const row = (await Session.findByPk(sid))!;
      const data = JSON.parse(row.data!);
      expect(data.signedInAt).toBeGreaterThan(Date.now() - 60_000);
      await Session.update(
        { data: JSON.stringify({ ...data, signedInAt: Date.now() - hours * 3_600_000 }) },
        { where: { sid } },
      );
      return () => Session.update({ data: row.data }, { where: { sid } });
    };

    const restore = await signedInHoursAgo(23);
    expect((await request(testApp()).get('/api/auth/me').set('Cookie', cookiePair(setCookie))).status).toBe(200);
    await restore();
    await signedInHoursAgo(25);
    expect((await request(testApp()).get('/api/auth/me').set('Cookie', cookiePair(setCookie))).status).toBe(401);
    expect(await Session.findByPk(sid)).toBeNull();
  });

  it('a session unused for more than 8 hours ends on the server, even if the cookie is replayed (idle timeout)', async () => {
    const user = await newUser(t);
    const setCookie = sessionSetCookie(await signIn(testApp(), user.email, GOOD_PASSWORD))!;
    const sid = sidOf(setCookie);
    // One request records when the session was last seen.
    expect((await request(testApp()).get('/api/auth/me').set('Cookie', cookiePair(setCookie))).status).toBe(200);
    const lastSeenHoursAgo = async (hours: number) => {
      const row = (await Session.findByPk(sid))!;
      const data = JSON.parse(row.data!);
      expect(data.lastSeenAt).toBeGreaterThan(Date.now() - 60_000);
      await Session.update(
        { data: JSON.stringify({ ...data, lastSeenAt: Date.now() - hours * 3_600_000 }) },
        { where: { sid } },
      );
    };
    await lastSeenHoursAgo(7);
    expect((await request(testApp()).get('/api/auth/me').set('Cookie', cookiePair(setCookie))).status).toBe(200);
    await lastSeenHoursAgo(9);
    expect((await request(testApp()).get('/api/auth/me').set('Cookie', cookiePair(setCookie))).status).toBe(401);
    expect(await Session.findByPk(sid)).toBeNull();
  });
});

describe('sign-in is audited', () => {
  it('success records the person, brewery and ip', async () => {
    const user = await newUser(t);
    const res = await signIn(testApp(), user.email, GOOD_PASSWORD);
    expect(res.status).toBe(200);
    const rows = await AuditEvent.findAll({ where: { action: 'sign-in.success', userId: user.id } });
    const row = theOne(rows, 'sign-in audit row');
    expect(row.breweryId).toBe(t.brewery.id);
    expect(row.ip).toMatch(/127\.0\.0\.1|::1/);
    expect(row.requestId).toBe(res.headers['x-request-id']);
  });

  it('failure records the e-mail tried and the ip, with no person', async () => {
    const fresh = createApp();
    const email = `guess.${randomBytes(4).toString('hex')}@test.example`;
    const res = await signIn(fresh, email, 'wrong-password-here');
    expect(res.status).toBe(401);
    const rows = await AuditEvent.findAll({
      where: { action: 'sign-in.failure', requestId: res.headers['x-request-id'] },
    });
    const row = theOne(rows, 'sign-in failure audit row');
    expect(row.userId).toBeNull();
    expect(row.ip).toMatch(/127\.0\.0\.1|::1/);
    expect(row.detail).toEqual({ email });
  });
});

describe('changing a password', () => {
  it('ends the person’s other sessions but keeps the current one; the old password stops working', async () => {
    const user = await newUser(t);
    const here = agent();
    expect((await here.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD })).status).toBe(
      200,
    );
    const elsewhere = agent();
    expect(
      (await elsewhere.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD })).status,
    ).toBe(200);

    const res = await here
      .post('/api/auth/password')
      .send({ currentPassword: GOOD_PASSWORD, newPassword: NEW_PASSWORD });
    expect(res.status).toBe(204);

    expect((await here.get('/api/auth/me')).status).toBe(200);
    expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
    expect(await AuditEvent.findOne({ where: { action: 'password.change', userId: user.id } })).not.toBeNull();

    const fresh = createApp();
    expect((await signIn(fresh, user.email, GOOD_PASSWORD)).status).toBe(401);
    expect((await signIn(fresh, user.email, NEW_PASSWORD)).status).toBe(200);
  });

  it('refuses a wrong current password and leaves the password as it was', async () => {
    const user = await newUser(t);
    const here = agent();
    await here.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD });
    const res = await here
      .post('/api/auth/password')
      .send({ currentPassword: 'not-my-password', newPassword: NEW_PASSWORD });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('currentPassword');
    await user.reload();
    expect(user.passwordHash).toBe(t.users.head_brewer.passwordHash);
  });
});

describe('password reset by e-mail', () => {
  /** The token of the one reset mail sent to this address (it is sent after the request has answered). */
  async function resetToken(email: string): Promise<string> {
    const mail = await mailCatcher().waitFor((m) => m.to.includes(email) && m.subject.includes('Reset'));
    expect(
      mailCatcher()
        .messages()
        .filter((m) => m.to.includes(email)),
    ).toHaveLength(1);
    return captured(mail.text, /\/reset\/([A-Za-z0-9_-]+)/);
  }

  it('request → mail → new password: the old one fails, the new one works, other sessions end, the link works once', async () => {
    const user = await newUser(t);
    const signedIn = agent();
    expect((await signedIn.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD })).status).toBe(
      200,
    );

    const asked = await agent().post('/api/auth/reset-request').send({ email: user.email });
    expect(asked.status).toBe(202);
    const token = await resetToken(user.email);
    expect((await agent().get(`/api/auth/reset/${token}`)).status).toBe(204);

    const reset = await agent().post(`/api/auth/reset/${token}`).send({ password: NEW_PASSWORD });
    expect(reset.status).toBe(204);

    expect((await signedIn.get('/api/auth/me')).status).toBe(401);
    expect(await Session.count({ where: { userId: user.id } })).toBe(0);
    const fresh = createApp();
    expect((await signIn(fresh, user.email, GOOD_PASSWORD)).status).toBe(401);
    expect((await signIn(fresh, user.email, NEW_PASSWORD)).status).toBe(200);

    const again = await agent().post(`/api/auth/reset/${token}`).send({ password: 'another-fresh-phrase-for-me' });
    expect(again.status).toBe(404);
    // The page checks the link when it opens and says why it cannot be used, before a password is typed.
    const opened = await agent().get(`/api/auth/reset/${token}`);
    expect(opened.status).toBe(404);
    expect(opened.body.error.message).toBe(
      'This reset link has been used or has expired. Ask for a new one from the sign-in page.',
    );
    expect(await AuditEvent.findOne({ where: { action: 'password.reset', userId: user.id } })).not.toBeNull();
  });

  it('answers an unknown e-mail exactly like a known one (status, body, headers); only the known one gets a link, stored before the answer', async () => {
    /** Everything a client sees of the answer except what differs on every request. */
    const seen = (res: Response) => {
      const { date: _date, 'x-request-id': _id, ...headers } = res.headers as Record<string, string>;
      return { status: res.status, body: res.body, headers };
    };
    const known = await newUser(t);
    const stranger = `stranger.${randomBytes(4).toString('hex')}@test.example`;
    // Each from a fresh app, so both meet the same empty sign-in limiter and its headers match.
    const unknownAnswer = await agent(createApp()).post('/api/auth/reset-request').send({ email: stranger });
    const knownAnswer = await agent(createApp()).post('/api/auth/reset-request').send({ email: known.email });
    expect(knownAnswer.status).toBe(202);
    expect(seen(unknownAnswer)).toEqual(seen(knownAnswer));

    // The link is stored by the time the request answers; the mail follows in the background.
    const stored = await Invite.findAll({ where: { email: known.email, purpose: 'reset' } });
    const invite = theOne(stored, 'stored reset link');
    expect(await Invite.count({ where: { email: stranger } })).toBe(0);
    expect(hashToken(await resetToken(known.email))).toBe(invite.tokenHash);
    // The stranger's request was answered first, so a mail for it would have been on its way before the known one's.
    expect(
      mailCatcher()
        .messages()
        .filter((m) => m.to.includes(stranger)),
    ).toHaveLength(0);
  });

  it('a reset mail the mail server refuses still answers 202, keeps the link, and is logged as an error', async () => {
    const logged: Array<Record<string, unknown>> = [];
    const app = createApp({
      logger: pino({ level: 'error' }, { write: (line: string) => logged.push(JSON.parse(line)) }),
    });
    const user = await newUser(t);
    await user.update({ email: `person.${randomBytes(4).toString('hex')}@${UNDELIVERABLE_DOMAIN}` });

    const res = await agent(app).post('/api/auth/reset-request').send({ email: user.email });
    expect(res.status).toBe(202);
    expect(await Invite.count({ where: { email: user.email, purpose: 'reset' } })).toBe(1);
    await vi.waitFor(
      () =>
        expect(logged).toContainEqual(
          expect.objectContaining({ msg: 'e-mail could not be sent', subject: 'Reset your Kettlewright password' }),
        ),
      { timeout: 5000 },
    );
  });

  it('a made-up reset token answers 404', async () => {
    const res = await agent()
      .post(`/api/auth/reset/${randomBytes(32).toString('base64url')}`)
      .send({ password: NEW_PASSWORD });
    expect(res.status).toBe(404);
  });
});
