import { hashPassword, verifyPassword } from './passwords';

describe('password hashing', () => {
  it('uses Argon2id with the OWASP minimum parameters (m=19456 KiB, t=2, p=1)', async () => {
    // OWASP Password Storage Cheat Sheet, "Argon2id" recommended minimum configuration.
    const stored = await hashPassword('plaster-and-glaze');
    expect(stored).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
    expect(await verifyPassword(stored, 'plaster-and-glaze')).toBe(true);
    expect(await verifyPassword(stored, 'plaster-and-glazf')).toBe(false);
    expect(await verifyPassword('not-a-hash', 'x')).toBe(false);
  });
});
