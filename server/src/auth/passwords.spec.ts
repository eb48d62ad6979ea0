import { HttpError } from '../http/problem';
import { assertNoContextWords, contextWords, hashPassword, verifyPassword } from './passwords';

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

describe('context words in a new password (OWASP ASVS 5.0 §6.2)', () => {
  const person = { email: 'dorcas.velliquette@saltmarsh.example', name: 'Dorcas Velliquette', firmNames: ['Saltmarsh Fresco & Co'] };
  const refused = (password: string) => {
    try {
      assertNoContextWords(password, person);
      return null;
    } catch (error) {
      return error instanceof HttpError ? error.errors : error;
    }
  };

  it.each([
    ['the e-mail', 'dorcas.velliquette@saltmarsh.example'],
    ['the e-mail local part', 'dorcas.velliquette'],
    ['a piece of the local part, in capitals', 'my-VELLIQUETTE-pass'],
    ['the first name inside other words', 'burnished-dorcas-wax'],
    ['a firm-name word', 'fresco-on-the-ceiling-9'],
    ['a firm-name word, mixed case', 'SaltMarsh-glaze-2026'],
  ])('refuses %s, naming `password`', (_what, password) => {
    expect(refused(password)).toEqual([{ field: 'password', message: expect.stringMatching(/name, your e-mail or your firm/) }]);
  });

  it.each([
    ['words under four letters ("Co")', 'cobalt-and-umber-77'],
    ['unrelated words', 'burnished-wax-at-dusk'],
  ])('accepts %s', (_what, password) => {
    expect(refused(password)).toBeNull();
  });

  it('lists the words it checks: whole local part and its pieces, name and firm words of four letters or more', () => {
    expect(contextWords(person).sort()).toEqual(['dorcas', 'dorcas.velliquette', 'fresco', 'saltmarsh', 'velliquette'].sort());
  });
});
