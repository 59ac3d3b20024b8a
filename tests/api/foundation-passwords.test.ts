// Foundation: password rules (NIST SP 800-63B §5.1.1.2: at least 8, at least 64 allowed, no composition rules,
// refuse commonly used passwords) on every path that sets one.
import { randomBytes } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { Brewery, User } from '../../server/models';
import { GOOD_PASSWORD, agent, createTestBrewery, mailCatcher, type TestBrewery } from './helpers';

const tag = () => randomBytes(4).toString('hex');

function signUp(password: string) {
  const breweryName = `Password Rules Brewing ${tag()}`;
  const email = `founder.${tag()}@test.example`;
  return {
    breweryName,
    email,
    request: agent().post('/api/auth/sign-up').send({
      breweryName,
      displayName: 'Sam Sparge',
      email,
      password,
      unitSystem: 'us',
      timeZone: 'America/Chicago',
    }),
  };
}

describe('password rules at sign-up', () => {
  it('refuses fewer than 8 characters, naming the field, and creates nothing', async () => {
    const { request, breweryName, email } = signUp('hop7vat');
    const res = await request;
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toMatch(/at least 8/);
    expect(await Brewery.count({ where: { name: breweryName } })).toBe(0);
    expect(await User.count({ where: { email } })).toBe(0);
  });

  it('accepts a 64-character passphrase, and that exact passphrase signs in', async () => {
    const passphrase = 'the quiet cellar keeps forty barrels of amber ale for winter nig';
    expect(passphrase).toHaveLength(64);
    const { request, email } = signUp(passphrase);
    const res = await request;
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.role).toBe('head_brewer');
    const again = await agent(createApp()).post('/api/auth/sign-in').send({ email, password: passphrase });
    expect(again.status).toBe(200);
  });

  it('has no composition rules: a long all-lowercase passphrase without digits or symbols is accepted', async () => {
    const { request } = signUp('mashtunlanternwhisperingbarleyfield');
    expect((await request).status).toBe(201);
  });

  it('refuses a commonly used password ("password123") with the estimator’s reason', async () => {
    const res = await signUp('password123').request;
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toContain('This is a commonly used password');
  });

  it('refuses an easily guessed word-and-year ("brewery2024") with the estimator’s suggestion', async () => {
    const res = await signUp('brewery2024').request;
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toContain('Add more words that are less common');
  });

  it('refuses the brewery’s own name as the password (the sign-up’s details are given to the estimator)', async () => {
    const breweryName = 'Quiet Heron Alehouse';
    const res = await agent()
      .post('/api/auth/sign-up')
      .send({
        breweryName,
        displayName: 'Sam Sparge',
        email: `heron.${tag()}@test.example`,
        password: breweryName,
        unitSystem: 'metric',
        timeZone: 'UTC',
      });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toContain('personal or page related data');
  });

  it('refuses more than 128 characters', async () => {
    const res = await signUp('barley '.repeat(19)).request; // 133 characters
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toMatch(/at most 128/);
  });
});

describe('the same rules wherever a password is set', () => {
  let t: TestBrewery;
  beforeAll(async () => {
    t = await createTestBrewery();
  });

  it('changing a password refuses a common one, naming newPassword', async () => {
    const res = await t.as.assistant_brewer
      .post('/api/auth/password')
      .send({ currentPassword: GOOD_PASSWORD, newPassword: 'password123' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.newPassword).toContain('commonly used password');
  });

  it('accepting an invite refuses a short or common password and leaves the invite usable', async () => {
    const email = `weak.${tag()}@test.example`;
    expect((await t.as.head_brewer.post('/api/team/invites').send({ email, role: 'taproom_manager' })).status).toBe(
      201,
    );
    const token = mailCatcher()
      .messages()
      .find((m) => m.to.includes(email))!
      .text.match(/\/join\/([A-Za-z0-9_-]+)/)![1];

    const short = await agent().post(`/api/auth/invites/${token}`).send({ displayName: 'Weak', password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields).toHaveProperty('password');
    const common = await agent()
      .post(`/api/auth/invites/${token}`)
      .send({ displayName: 'Weak', password: 'password123' });
    expect(common.status).toBe(400);
    expect(common.body.error.fields.password).toContain('commonly used password');

    expect((await agent().get(`/api/auth/invites/${token}`)).status).toBe(200);
    expect(await User.count({ where: { email } })).toBe(0);
  });

  it('a password reset refuses a common password and leaves the link usable', async () => {
    const email = t.users.taproom_manager.email;
    expect((await agent().post('/api/auth/reset-request').send({ email })).status).toBe(202);
    const token = (await mailCatcher().waitFor((m) => m.to.includes(email) && m.subject.includes('Reset'))).text.match(
      /\/reset\/([A-Za-z0-9_-]+)/,
    )![1];
    const weak = await agent().post(`/api/auth/reset/${token}`).send({ password: 'brewery2024' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields).toHaveProperty('password');
    // The refused attempt did not spend the link.
    expect(
      (await agent().post(`/api/auth/reset/${token}`).send({ password: 'juniper-foghorn-satchel-12' })).status,
    ).toBe(204);
  });
});
