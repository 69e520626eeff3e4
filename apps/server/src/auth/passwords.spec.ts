import { describe, expect, it } from 'vitest';
import { hashPassword, verifyPassword } from './passwords.js';

describe('passwords', () => {
  it('verifies the right password and refuses others', async () => {
    const hash = await hashPassword('pickled beets in spring');
    expect(hash).not.toContain('pickled');
    await expect(verifyPassword('pickled beets in spring', hash)).resolves.toBe(true);
    await expect(verifyPassword('pickled beets in Spring', hash)).resolves.toBe(false);
  });

  it('salts every hash', async () => {
    const [a, b] = await Promise.all([hashPassword('same words'), hashPassword('same words')]);
    expect(a).not.toBe(b);
  });

  it('never matches a malformed stored hash', async () => {
    await expect(verifyPassword('x', 'plain-text')).resolves.toBe(false);
    await expect(verifyPassword('x', 'bcrypt$1$2$3$4$5')).resolves.toBe(false);
  });
});
