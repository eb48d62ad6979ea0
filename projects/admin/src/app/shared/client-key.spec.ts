import { newClientKey } from './client-key';

describe('client keys', () => {
  it('are version 4 UUIDs (RFC 9562 §5.4: version nibble 4, variant bits 10)', () => {
    const key = newClientKey(() => new Uint8Array(16).fill(0xff));
    expect(key).toBe('ffffffff-ffff-4fff-bfff-ffffffffffff');
    expect(newClientKey()).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(newClientKey()).not.toBe(newClientKey());
  });
});
