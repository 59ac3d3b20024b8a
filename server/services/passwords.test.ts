import { describe, expect, it } from 'vitest';
import bcrypt from 'bcryptjs';
import { assertStrongPassword, checkPassword, hashPassword } from './passwords';
import { env } from '../config/env';
import { HttpError } from '../errors';

describe('password hashing', () => {
  it('counts every character of a long passphrase (bcrypt alone stops at 72 bytes)', async () => {
    const base = 'a'.repeat(80);
    const hash = await hashPassword(`${base}-first`);
    expect(await checkPassword(`${base}-first`, hash)).toBe(true);
    expect(await checkPassword(`${base}-other`, hash)).toBe(false);
  });

  it('hashes at the configured bcrypt cost', async () => {
    const hash = await hashPassword('slate-otter-windmill-45');
    expect(bcrypt.getRounds(hash)).toBe(env.BCRYPT_COST);
  });
});

describe('refusing a weak password', () => {
  it('words the reason as whole sentences, each ending in one full stop', () => {
    for (const password of ['password1', 'qwertyuiop', 'aaaaaaaaaa']) {
      let message = '';
      try {
        assertStrongPassword(password);
      } catch (error) {
        message = (error as HttpError).fields?.password ?? '';
      }
      expect(message).toMatch(/^[^.]+\. [^.]+\.$/);
    }
  });
});
