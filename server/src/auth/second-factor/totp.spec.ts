import { totp } from 'otplib';
import { acceptedStep, codeAt, newTotpSecret, otpauthUri, secretGroups, STEP_SECONDS } from './totp';
import { normaliseRecoveryCode, newRecoveryCodes } from './recovery-codes';

/**
 * RFC 6238 Appendix B: SHA-1, the ASCII seed "12345678901234567890", 8 digits, 30-second steps —
 * otplib's totp with our step (its defaults are SHA-1 and an ASCII key, as our app codes use).
 */
const rfc = totp.clone({ digits: 8, step: STEP_SECONDS });
const SEED = '12345678901234567890';

describe('TOTP through otplib', () => {
  it.each([
    [59, '94287082'], // RFC 6238 Appendix B
    [1111111109, '07081804'], // RFC 6238 Appendix B
    [1111111111, '14050471'], // RFC 6238 Appendix B
    [1234567890, '89005924'], // RFC 6238 Appendix B
    [2000000000, '69279037'], // RFC 6238 Appendix B
    [20000000000, '65353130'], // RFC 6238 Appendix B
  ])('at T = %i s the code is %s', (seconds, code) => {
    expect(rfc.clone({ epoch: seconds * 1000 }).generate(SEED)).toBe(code);
  });

  const secret = newTotpSecret();
  const now = new Date('2026-12-03T10:00:10Z');
  const step = Math.floor(now.getTime() / 1000 / STEP_SECONDS);
  const shifted = (steps: number) => new Date(now.getTime() + steps * STEP_SECONDS * 1000);

  it('accepts the code of this step and of one step either side (RFC 6238 §5.2), not two', () => {
    expect(acceptedStep(secret, codeAt(secret, now), now, null)).toBe(step);
    expect(acceptedStep(secret, codeAt(secret, shifted(-1)), now, null)).toBe(step - 1);
    expect(acceptedStep(secret, codeAt(secret, shifted(1)), now, null)).toBe(step + 1);
    expect(acceptedStep(secret, codeAt(secret, shifted(-2)), now, null)).toBeNull();
    expect(acceptedStep(secret, codeAt(secret, shifted(2)), now, null)).toBeNull();
  });

  it('refuses a step at or before the last one used', () => {
    expect(acceptedStep(secret, codeAt(secret, now), now, step)).toBeNull();
    expect(acceptedStep(secret, codeAt(secret, shifted(-1)), now, step - 1)).toBeNull();
    expect(acceptedStep(secret, codeAt(secret, shifted(1)), now, step)).toBe(step + 1);
  });

  it('writes the otpauth URI apps read and groups the secret for typing', () => {
    expect(secret).toMatch(/^[A-Z2-7]{32}$/); // RFC 4648 base32 of 160 bits
    expect(otpauthUri('ana@example.com', secret)).toBe(
      `otpauth://totp/Layerbook:ana%40example.com?secret=${secret}&period=30&digits=6&algorithm=SHA1&issuer=Layerbook`,
    );
    expect(secretGroups(secret).join('')).toBe(secret);
    expect(secretGroups(secret)).toHaveLength(8);
  });
});

describe('recovery codes', () => {
  it('makes ten different codes that read back however they are typed', () => {
    const codes = newRecoveryCodes();
    expect(new Set(codes).size).toBe(10);
    for (const code of codes) {
      expect(code).toMatch(/^[a-z2-9]{5}-[a-z2-9]{5}$/);
      expect(normaliseRecoveryCode(` ${code.toUpperCase().replace('-', ' - ')} `)).toBe(code.replace('-', ''));
    }
    expect(normaliseRecoveryCode('123456')).toBeNull();
    expect(normaliseRecoveryCode('abcde-fgh0k')).toBeNull();
  });
});
