import { describe, expect, it } from 'vitest';
import { checkPassword, hashPassword } from './passwords';

describe('password hashing', () => {
  it('counts every character of a long passphrase (bcrypt alone stops at 72 bytes)', async () => {
    const base = 'a'.repeat(80);
    const hash = await hashPassword(`${base}-first`);
    expect(await checkPassword(`${base}-first`, hash)).toBe(true);
    expect(await checkPassword(`${base}-other`, hash)).toBe(false);
  });

  it('uses a bcrypt cost of at least 10', async () => {
    const hash = await hashPassword('slate-otter-windmill-45');
    expect(Number(hash.split('$')[2])).toBeGreaterThanOrEqual(10);
  });
});
