// Foundation: the team — invites by e-mail, role and access changes, and one brewery never reaching another's people.
import { randomBytes } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Invite, Session, User, type Brewery } from '../../server/models';
import { createBrewery } from '../../server/services/auth';
import { hashToken } from '../../server/services/tokens';
import { GOOD_PASSWORD, agent, captured, createTestBrewery, mailCatcher, theOne, type TestBrewery } from './helpers';

const tag = () => randomBytes(4).toString('hex');

/** A teammate of the brewery with GOOD_PASSWORD, signed in on their own agent. */
async function signedInTeammate(t: TestBrewery, role: User['role']) {
  const user = await User.create({
    breweryId: t.brewery.id,
    email: `mate.${tag()}@test.example`,
    displayName: `Mate ${tag()}`,
    role,
    passwordHash: t.users.head_brewer.passwordHash,
    disabledAt: null,
  });
  const as = agent();
  const res = await as.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD });
  expect(res.status).toBe(200);
  return { user, as };
}

let a: TestBrewery;
let other: { brewery: Brewery; user: User };

beforeAll(async () => {
  a = await createTestBrewery();
  // Brewery B needs a person, not a session: created directly.
  const brewery = await createBrewery({
    name: `Other brewery ${tag()}`,
    unitSystem: 'metric',
    timeZone: 'Europe/Berlin',
  });
  const user = await User.create({
    breweryId: brewery.id,
    email: `other.${tag()}@test.example`,
    displayName: 'Other assistant',
    role: 'assistant_brewer',
    passwordHash: a.users.head_brewer.passwordHash,
    disabledAt: null,
  });
  other = { brewery, user };
});

describe('one brewery cannot reach another', () => {
  it('a head brewer PATCHing a user of another brewery gets 404 and that user is unchanged', async () => {
    const before = (await User.findByPk(other.user.id))!.toJSON();

    const role = await a.as.head_brewer.patch(`/api/team/${other.user.id}`).send({ role: 'head_brewer' });
    expect(role.status).toBe(404);
    expect(role.body.error.code).toBe('not_found');
    const disable = await a.as.head_brewer.patch(`/api/team/${other.user.id}`).send({ disabled: true });
    expect(disable.status).toBe(404);

    const after = (await User.findByPk(other.user.id))!.toJSON();
    expect(after).toEqual(before);
  });

  it('the same request for a teammate of one’s own brewery succeeds (so the 404 above is about the brewery)', async () => {
    const { user } = await signedInTeammate(a, 'assistant_brewer');
    const res = await a.as.head_brewer.patch(`/api/team/${user.id}`).send({ role: 'taproom_manager' });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: user.id, role: 'taproom_manager', disabled: false });
  });

  it('the team list holds only one’s own brewery', async () => {
    const res = await a.as.head_brewer.get('/api/team');
    expect(res.status).toBe(200);
    const ids = res.body.members.map((m: { id: number }) => m.id);
    expect(ids).toEqual(expect.arrayContaining(Object.values(a.users).map((u) => u.id)));
    expect(ids).not.toContain(other.user.id);
  });
});

describe('inviting a teammate by e-mail', () => {
  it('mail arrives with a /join link; the link describes the invite, signs the person up once, and both steps are audited', async () => {
    const email = `new.brewer.${tag()}@test.example`;
    const sent = await a.as.head_brewer.post('/api/team/invites').send({ email, role: 'assistant_brewer' });
    expect(sent.status).toBe(201);
    expect(sent.body).toMatchObject({ id: expect.any(Number), email });

    const mail = mailCatcher()
      .messages()
      .filter((m) => m.to.includes(email));
    const message = theOne(mail, 'invitation mail');
    expect(message.subject).toContain(a.brewery.name);
    const token = captured(message.text, /https?:\/\/\S+\/join\/([A-Za-z0-9_-]+)/);
    // Only the token's hash is stored.
    const invite = await Invite.findByPk(sent.body.id);
    expect(invite!.tokenHash).toBe(hashToken(token));
    expect(invite!.tokenHash).not.toContain(token);

    const described = await agent().get(`/api/auth/invites/${token}`);
    expect(described.status).toBe(200);
    expect(described.body).toEqual({ email, breweryName: a.brewery.name, role: 'assistant_brewer' });

    const newcomer = agent();
    const accepted = await newcomer
      .post(`/api/auth/invites/${token}`)
      .send({ displayName: 'New Brewer', password: GOOD_PASSWORD });
    expect(accepted.status).toBe(201);
    expect(accepted.body).toMatchObject({
      email,
      displayName: 'New Brewer',
      role: 'assistant_brewer',
      brewery: { id: a.brewery.id },
    });
    const me = await newcomer.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({ email, role: 'assistant_brewer', brewery: { id: a.brewery.id } });

    const twice = await agent()
      .post(`/api/auth/invites/${token}`)
      .send({ displayName: 'Someone Else', password: GOOD_PASSWORD });
    expect(twice.status).toBe(404);
    expect((await agent().get(`/api/auth/invites/${token}`)).status).toBe(404);
    expect(await User.count({ where: { email } })).toBe(1);

    const sendAudit = await AuditEvent.findAll({ where: { action: 'invite.send', userId: a.users.head_brewer.id } });
    expect(sendAudit.map((e) => e.detail)).toContainEqual({
      email,
      role: 'assistant_brewer',
    });
    const acceptAudit = await AuditEvent.findOne({ where: { action: 'invite.accept', userId: accepted.body.id } });
    expect(acceptAudit).not.toBeNull();
    expect(acceptAudit!.breweryId).toBe(a.brewery.id);
  });

  it('an e-mail that already has an account cannot be invited (409) and no mail is sent', async () => {
    const email = a.users.taproom_manager.email;
    const mailBefore = mailCatcher().messages().length;
    const res = await a.as.head_brewer.post('/api/team/invites').send({ email, role: 'assistant_brewer' });
    expect(res.status).toBe(409);
    expect(mailCatcher().messages().length).toBe(mailBefore);
  });

  it('an expired invite is not honoured', async () => {
    const email = `late.${tag()}@test.example`;
    const sent = await a.as.head_brewer.post('/api/team/invites').send({ email, role: 'taproom_manager' });
    expect(sent.status).toBe(201);
    const token = mailCatcher()
      .messages()
      .find((m) => m.to.includes(email))!
      .text.match(/\/join\/([A-Za-z0-9_-]+)/)![1];
    await Invite.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: sent.body.id } });
    expect((await agent().get(`/api/auth/invites/${token}`)).status).toBe(404);
    expect(
      (await agent().post(`/api/auth/invites/${token}`).send({ displayName: 'Late', password: GOOD_PASSWORD })).status,
    ).toBe(404);
    expect(await User.count({ where: { email } })).toBe(0);
  });
});

describe('changing a teammate’s access and role', () => {
  it('disabling a user ends their sessions at once and stops them signing in; re-enabling lets them back', async () => {
    const { user, as } = await signedInTeammate(a, 'taproom_manager');
    expect((await as.get('/api/auth/me')).status).toBe(200);

    const res = await a.as.head_brewer.patch(`/api/team/${user.id}`).send({ disabled: true });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: user.id, role: 'taproom_manager', disabled: true });

    // The rows go at once, before the person's next request could notice the account is disabled.
    expect(await Session.count({ where: { userId: user.id } })).toBe(0);
    expect((await as.get('/api/auth/me')).status).toBe(401);
    expect((await agent().post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD })).status).toBe(
      401,
    );
    expect(
      await AuditEvent.findOne({ where: { action: 'access.change', userId: a.users.head_brewer.id } }),
    ).not.toBeNull();

    expect((await a.as.head_brewer.patch(`/api/team/${user.id}`).send({ disabled: false })).status).toBe(200);
    expect((await agent().post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD })).status).toBe(
      200,
    );
  });

  it('a role change is saved and audited as role.change by the head brewer, naming the person and the new role', async () => {
    const { user } = await signedInTeammate(a, 'assistant_brewer');
    const res = await a.as.head_brewer.patch(`/api/team/${user.id}`).send({ role: 'taproom_manager' });
    expect(res.status).toBe(200);
    await user.reload();
    expect(user.role).toBe('taproom_manager');

    const rows = await AuditEvent.findAll({
      where: { action: 'role.change', userId: a.users.head_brewer.id, breweryId: a.brewery.id },
    });
    const details = rows.map((e) => e.detail);
    expect(details).toContainEqual({ userId: user.id, role: 'taproom_manager' });
    const row = rows[details.findIndex((d) => d?.userId === user.id)];
    expect(row?.ip).toMatch(/127\.0\.0\.1|::1/);
  });

  it('the new role takes effect: a person moved to taproom manager is refused head-brewer routes', async () => {
    const { user } = await signedInTeammate(a, 'head_brewer');
    await a.as.head_brewer.patch(`/api/team/${user.id}`).send({ role: 'taproom_manager' });
    const as = agent();
    expect((await as.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD })).status).toBe(200);
    expect((await as.get('/api/team')).status).toBe(403);
  });

  it('a head brewer cannot change their own role or access (409)', async () => {
    const res = await a.as.head_brewer.patch(`/api/team/${a.users.head_brewer.id}`).send({ disabled: true });
    expect(res.status).toBe(409);
    expect((await a.as.head_brewer.get('/api/auth/me')).status).toBe(200);
  });

  it('a refused request is audited as request.denied with the path', async () => {
    const res = await a.as.assistant_brewer.get('/api/team');
    expect(res.status).toBe(403);
    const row = await AuditEvent.findOne({
      where: { action: 'request.denied', userId: a.users.assistant_brewer.id },
      order: [['id', 'DESC']],
    });
    expect(row).not.toBeNull();
    expect(row!.detail).toEqual({ method: 'GET', path: '/api/team' });
  });
});
