// Foundation: the sign-in limiter, forged cross-site writes, malformed input, append-only audit grants, re-grants without a gap, a durable database.
import { randomBytes } from 'node:crypto';
import { QueryTypes, Sequelize } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { sequelize } from '../../server/config/database';
import { durabilityProblems } from '../../server/config/durability';
import { migrate } from '../../server/migrations/umzug';
import { AuditEvent, Invite, User } from '../../server/models';
import { GOOD_PASSWORD, agent, createTestBrewery, mailCatcher, type Agent, type TestBrewery } from './helpers';

const tag = () => randomBytes(4).toString('hex');

let t: TestBrewery;
beforeAll(async () => {
  t = await createTestBrewery();
});

describe('sign-in rate limit', () => {
  it('malformed bodies are not counted; five wrong passwords answer 401 and the sixth attempt answers 429, even with the right password', async () => {
    const client = agent(createApp()); // a fresh app: the limiter's memory starts empty
    const email = t.users.taproom_manager.email;
    const malformed: Array<[string, () => ReturnType<Agent['post']>]> = [
      ['no e-mail', () => client.post('/api/auth/sign-in').send({ password: GOOD_PASSWORD })],
      ['no password', () => client.post('/api/auth/sign-in').send({ email })],
      ['no body', () => client.post('/api/auth/sign-in')],
      [
        'an unknown field',
        () => client.post('/api/auth/sign-in').send({ email, password: GOOD_PASSWORD, remember: true }),
      ],
      ['a number for the e-mail', () => client.post('/api/auth/sign-in').send({ email: 42, password: GOOD_PASSWORD })],
      ['an empty password', () => client.post('/api/auth/sign-in').send({ email, password: '' })],
      ['a reset request without an e-mail', () => client.post('/api/auth/reset-request').send({})],
    ];
    for (const [what, send] of malformed) expect((await send()).status, what).toBe(400);
    expect((await client.post('/api/auth/sign-in').send({ email, password: GOOD_PASSWORD })).status).toBe(200);

    for (let i = 1; i <= 5; i++) {
      const res = await client.post('/api/auth/sign-in').send({ email, password: `wrong-guess-${i}` });
      expect(res.status, `attempt ${i}`).toBe(401);
    }
    const sixth = await client.post('/api/auth/sign-in').send({ email, password: 'wrong-guess-6' });
    expect(sixth.status).toBe(429);
    expect(sixth.body.error.code).toBe('too_many_attempts');
    const right = await client.post('/api/auth/sign-in').send({ email, password: GOOD_PASSWORD });
    expect(right.status).toBe(429);
    // The same limiter guards reset requests.
    expect((await client.post('/api/auth/reset-request').send({ email })).status).toBe(429);
  });

  it('successful sign-ins are not counted: four failures, a success, then the fifth failure is still 401', async () => {
    const client = agent(createApp());
    const email = t.users.taproom_manager.email;
    for (let i = 1; i <= 4; i++) {
      expect((await client.post('/api/auth/sign-in').send({ email, password: `nope-${i}` })).status).toBe(401);
    }
    expect((await client.post('/api/auth/sign-in').send({ email, password: GOOD_PASSWORD })).status).toBe(200);
    expect((await client.post('/api/auth/sign-in').send({ email, password: 'nope-5' })).status).toBe(401);
    expect((await client.post('/api/auth/sign-in').send({ email, password: 'nope-6' })).status).toBe(429);
  });

  it('a signed-in person guessing the current password to change it is stopped on the sixth try', async () => {
    const client = agent(createApp());
    const email = t.users.taproom_manager.email;
    expect((await client.post('/api/auth/sign-in').send({ email, password: GOOD_PASSWORD })).status).toBe(200);
    for (let i = 1; i <= 5; i++) {
      expect(
        (
          await client
            .post('/api/auth/password')
            .send({ currentPassword: `guess-${i}`, newPassword: 'Tidal-brine-copper-88' })
        ).status,
      ).toBe(400);
    }
    expect(
      (
        await client
          .post('/api/auth/password')
          .send({ currentPassword: 'guess-6', newPassword: 'Tidal-brine-copper-88' })
      ).status,
    ).toBe(429);
  });

  it('each app keeps its own count: a client blocked by one app signs in on a freshly created one', async () => {
    const blocked = agent(createApp());
    const email = t.users.taproom_manager.email;
    for (let i = 1; i <= 5; i++) await blocked.post('/api/auth/sign-in').send({ email, password: `miss-${i}` });
    expect((await blocked.post('/api/auth/sign-in').send({ email, password: GOOD_PASSWORD })).status).toBe(429);
    expect((await agent(createApp()).post('/api/auth/sign-in').send({ email, password: GOOD_PASSWORD })).status).toBe(
      200,
    );
  });
});

describe('forged cross-site writes are refused', () => {
  async function nothingWritten(email: string) {
    expect(await Invite.count({ where: { email } })).toBe(0);
    expect(
      mailCatcher()
        .messages()
        .filter((m) => m.to.includes(email)),
    ).toHaveLength(0);
  }

  it('without the x-kettlewright header → 403 and nothing is written', async () => {
    const email = `forged.${tag()}@test.example`;
    const res = await t.as.head_brewer
      .post('/api/team/invites')
      .unset('x-kettlewright')
      .send({ email, role: 'head_brewer' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    await nothingWritten(email);
  });

  it('with the header but Origin: https://evil.example → 403 and nothing is written', async () => {
    const email = `forged.${tag()}@test.example`;
    const res = await t.as.head_brewer
      .post('/api/team/invites')
      .set('Origin', 'https://evil.example')
      .send({ email, role: 'head_brewer' });
    expect(res.status).toBe(403);
    await nothingWritten(email);
  });

  it('a forged role change is refused and the teammate keeps their role', async () => {
    const target = t.users.assistant_brewer;
    const noHeader = await t.as.head_brewer
      .patch(`/api/team/${target.id}`)
      .unset('x-kettlewright')
      .send({ role: 'head_brewer' });
    const evil = await t.as.head_brewer
      .patch(`/api/team/${target.id}`)
      .set('Origin', 'https://evil.example')
      .send({ role: 'head_brewer' });
    expect(noHeader.status).toBe(403);
    expect(evil.status).toBe(403);
    expect((await User.findByPk(target.id))!.role).toBe('assistant_brewer');
  });

  it('a forged sign-in is refused before any session is made', async () => {
    const res = await agent()
      .post('/api/auth/sign-in')
      .unset('x-kettlewright')
      .send({ email: t.users.assistant_brewer.email, password: GOOD_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('the same write from our own origin with the header goes through (the refusals above are about the forgery)', async () => {
    const email = `genuine.${tag()}@test.example`;
    const res = await t.as.head_brewer
      .post('/api/team/invites')
      .set('Host', 'brew.example')
      .set('Origin', 'https://brew.example')
      .send({ email, role: 'assistant_brewer' });
    expect(res.status).toBe(201);
    expect(await Invite.count({ where: { email } })).toBe(1);
  });
});

describe('malformed bodies are answered 400, never 500', () => {
  interface Endpoint {
    name: string;
    method: 'post' | 'patch';
    path: () => string;
    /** Public routes get a fresh app each time: their refusals count against the sign-in limiter. */
    caller: () => Agent;
    valid: () => Record<string, unknown>;
    /** Fields named in `error.fields` when the body is `{}` ('_' where only the whole body can be blamed). */
    required: string[];
    wrongTypes: Record<string, unknown>;
    longField: string;
  }

  const wellFormedToken = () => randomBytes(32).toString('base64url');
  const endpoints: Endpoint[] = [
    {
      name: 'sign-in',
      method: 'post',
      path: () => '/api/auth/sign-in',
      caller: () => agent(createApp()),
      valid: () => ({ email: `someone.${tag()}@test.example`, password: 'any-password-at-all' }),
      required: ['email', 'password'],
      wrongTypes: { email: 42, password: ['a', 'b'] },
      longField: 'email',
    },
    {
      name: 'sign-up',
      method: 'post',
      path: () => '/api/auth/sign-up',
      caller: () => agent(createApp()),
      valid: () => ({
        breweryName: `Malformed Test Brewing ${tag()}`,
        displayName: 'Pat Kettle',
        email: `founder.${tag()}@test.example`,
        password: GOOD_PASSWORD,
        unitSystem: 'metric',
        timeZone: 'Europe/Dublin',
      }),
      required: ['breweryName', 'displayName', 'email', 'password', 'unitSystem', 'timeZone'],
      wrongTypes: { breweryName: 7, unitSystem: true, timeZone: 3 },
      longField: 'breweryName',
    },
    {
      name: 'team invite',
      method: 'post',
      path: () => '/api/team/invites',
      caller: () => t.as.head_brewer,
      valid: () => ({ email: `invitee.${tag()}@test.example`, role: 'taproom_manager' }),
      required: ['email', 'role'],
      wrongTypes: { email: { address: 'x' }, role: 1 },
      longField: 'email',
    },
    {
      name: 'accept invite',
      method: 'post',
      path: () => `/api/auth/invites/${wellFormedToken()}`,
      caller: () => agent(createApp()),
      valid: () => ({ displayName: 'Robin Mash', password: GOOD_PASSWORD }),
      required: ['displayName', 'password'],
      wrongTypes: { displayName: null, password: 12345678 },
      longField: 'displayName',
    },
    {
      name: 'team patch',
      method: 'patch',
      path: () => `/api/team/${t.users.taproom_manager.id}`,
      caller: () => t.as.head_brewer,
      valid: () => ({ role: 'taproom_manager' }),
      required: ['_'],
      wrongTypes: { role: 'owner', disabled: 'yes' },
      longField: 'role',
    },
  ];

  const send = (e: Endpoint) => e.caller()[e.method](e.path());
  const raw = (e: Endpoint, body: string) => send(e).set('Content-Type', 'application/json').send(body);

  describe.each(endpoints.map((e) => [e.name, e] as const))('%s', (_name, e) => {
    it('the valid body passes validation (so the refusals below are about the malformation)', async () => {
      const res = await send(e).send(e.valid());
      expect(res.status, JSON.stringify(res.body)).not.toBe(400);
      expect(res.status).toBeLessThan(500);
    });

    it('invalid JSON → 400 invalid_json', async () => {
      const res = await raw(e, '{"email": "a@b.example", ');
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('invalid_json');
    });

    it.each([
      ['a JSON array', '[{"email": "a@b.example"}]'],
      ['a JSON string', '"hello"'],
      ['a JSON number', '42'],
      ['JSON null', 'null'],
    ])('%s as the body → 400', async (_kind, body) => {
      const res = await raw(e, body);
      expect(res.status).toBe(400);
      expect(res.body.error).toMatchObject({ code: expect.stringMatching(/^invalid/), message: expect.any(String) });
    });

    it('no body at all → 400', async () => {
      const res = await send(e);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('invalid');
    });

    it('an unknown field → 400 naming it', async () => {
      const res = await send(e).send({ ...e.valid(), isAdmin: true });
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toEqual({ _: expect.stringContaining('isAdmin') });
    });

    it('wrong types → 400 naming each field', async () => {
      const res = await send(e).send({ ...e.valid(), ...e.wrongTypes });
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields).sort()).toEqual(Object.keys(e.wrongTypes).sort());
    });

    it('a huge string → 400 naming the field', async () => {
      const res = await send(e).send({ ...e.valid(), [e.longField]: 'x'.repeat(200_000) });
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual([e.longField]);
    });

    it('missing fields → 400 naming each', async () => {
      const res = await send(e).send({});
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields).sort()).toEqual([...e.required].sort());
    });
  });

  it('a body over the 1 MB limit → 413, not 500', async () => {
    const res = await agent(createApp())
      .post('/api/auth/sign-in')
      .send({ email: 'a@b.example', password: 'x'.repeat(1_100_000) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_large');
  });

  it('a malformed path id → 400 naming userId', async () => {
    for (const id of ['abc', '-1', '0', '1.5', '99999999999']) {
      const res = await t.as.head_brewer.patch(`/api/team/${id}`).send({ role: 'taproom_manager' });
      expect(res.status, id).toBe(400);
      expect(Object.keys(res.body.error.fields), id).toEqual(['userId']);
    }
  });

  it('a malformed invite token → 400 naming token', async () => {
    const res = await agent().get('/api/auth/invites/short');
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['token']);
  });
});

describe('audit_events is append-only for the application account', () => {
  let row: AuditEvent;
  beforeAll(async () => {
    // INSERT is allowed: the application records events through this same account.
    row = await AuditEvent.create({
      action: 'test.append-only',
      detail: { marker: tag() },
      userId: null,
      breweryId: t.brewery.id,
      ip: null,
      userAgent: null,
      requestId: null,
    });
  });

  it('UPDATE is denied by the database', async () => {
    await expect(
      sequelize.query('UPDATE audit_events SET action = ? WHERE id = ?', {
        replacements: ['tampered', row.id],
        type: QueryTypes.BULKUPDATE,
      }),
    ).rejects.toThrow(/UPDATE command denied/i);
  });

  it('DELETE is denied by the database', async () => {
    await expect(
      sequelize.query('DELETE FROM audit_events WHERE id = ?', { replacements: [row.id], type: QueryTypes.RAW }),
    ).rejects.toThrow(/DELETE command denied/i);
  });

  it('TRUNCATE is denied by the database', async () => {
    await expect(sequelize.query('TRUNCATE TABLE audit_events', { type: QueryTypes.RAW })).rejects.toThrow(
      /command denied/i,
    );
  });

  it('through the model as well, and the row is unchanged afterwards', async () => {
    await expect(AuditEvent.update({ action: 'tampered' }, { where: { id: row.id } })).rejects.toThrow(
      /UPDATE command denied/i,
    );
    await expect(AuditEvent.destroy({ where: { id: row.id } })).rejects.toThrow(/DELETE command denied/i);
    const again = await AuditEvent.findByPk(row.id);
    expect(again!.action).toBe('test.append-only');
    expect(again!.detail).toEqual(row.detail);
  });

  it('the same account may UPDATE an ordinary table (the denial is specific to the audit trail)', async () => {
    const affected = await sequelize.query('UPDATE breweries SET updated_at = NOW() WHERE id = ?', {
      replacements: [t.brewery.id],
      type: QueryTypes.BULKUPDATE,
    });
    expect(affected).toBe(1);
  });
});

describe('migrations re-grant the application account without a gap', () => {
  it('a stray privilege is revoked and the account keeps its own, while it goes on reading', async () => {
    const owner = new Sequelize(process.env.KW_OWNER_DATABASE_URL!.replace(/^mysql:/, 'mariadb:'), {
      dialect: 'mariadb',
      logging: false,
    });
    const appUser = decodeURIComponent(new URL(process.env.DATABASE_URL!).username);
    const privileges = async () =>
      (
        await owner.query<{ privilege: string }>(
          'SELECT PRIVILEGE_TYPE AS privilege FROM information_schema.TABLE_PRIVILEGES WHERE GRANTEE = ? AND TABLE_SCHEMA = DATABASE() AND TABLE_NAME = ?',
          { replacements: [`'${appUser}'@'127.0.0.1'`, 'alerts'], type: QueryTypes.SELECT },
        )
      )
        .map((r) => r.privilege)
        .sort();
    try {
      await owner.query(`GRANT ALTER ON alerts TO '${appUser}'@'127.0.0.1'`, { type: QueryTypes.RAW });
      expect(await privileges()).toContain('ALTER');
      // Reads through the app's account go on while the grants are rewritten: none may be refused.
      let reading = true;
      const reads = (async () => {
        let n = 0;
        while (reading)
          n += (await sequelize.query('SELECT COUNT(*) AS n FROM sessions', { type: QueryTypes.SELECT })).length;
        return n;
      })();
      await migrate(process.env.KW_OWNER_DATABASE_URL!, appUser);
      reading = false;
      expect(await reads).toBeGreaterThan(0);
      expect(await privileges()).toEqual(['DELETE', 'INSERT', 'SELECT', 'UPDATE']);
    } finally {
      await owner.close();
    }
  });
});

describe('database durability', () => {
  it('durabilityProblems() finds none on the test instance', async () => {
    expect(await durabilityProblems(sequelize)).toEqual([]);
  });
});
