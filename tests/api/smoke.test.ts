import { describe, expect, it } from 'vitest';
import { agent, createTestBrewery } from './helpers';

describe('smoke', () => {
  it('health answers and a head brewer signs in', async () => {
    const res = await agent().get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body.database).toBe(true);
    const { as, users } = await createTestBrewery();
    const me = await as.head_brewer.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.email).toBe(users.head_brewer.email);
  });
});
