import { hashPassword, verifyPassword } from './password.js';

describe('password hashing', () => {
  it('verifies the password it hashed and refuses any other', async () => {
    const stored = await hashPassword('lantern-demo-2026');
    expect(stored.startsWith('scrypt$16384$8$1$')).toBe(true);
    await expect(verifyPassword('lantern-demo-2026', stored)).resolves.toBe(true);
    await expect(verifyPassword('lantern-demo-2025', stored)).resolves.toBe(false);
  });

  it('salts every hash, so equal passwords store differently', async () => {
    const [a, b] = await Promise.all([hashPassword('same'), hashPassword('same')]);
    expect(a).not.toEqual(b);
  });

  it('refuses a malformed stored value instead of throwing', async () => {
    await expect(verifyPassword('x', 'plain-text')).resolves.toBe(false);
  });
});
