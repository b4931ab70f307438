import { describe, expect, it } from '@jest/globals';
import { hashPassword, verifyPassword } from './password.js';

describe('password hashing', () => {
  it('verifies the right password and refuses a wrong one', async () => {
    const stored = await hashPassword('wiretrail-demo');
    expect(stored).toMatch(/^scrypt\$32768\$8\$1\$/);
    await expect(verifyPassword('wiretrail-demo', stored)).resolves.toBe(true);
    await expect(verifyPassword('wiretrail-demo ', stored)).resolves.toBe(false);
  });

  it('salts every hash', async () => {
    expect(await hashPassword('same')).not.toBe(await hashPassword('same'));
  });

  it('refuses a stored value of an unknown scheme instead of throwing', async () => {
    await expect(verifyPassword('x', 'plain$x')).resolves.toBe(false);
    await expect(verifyPassword('x', '')).resolves.toBe(false);
  });
});
