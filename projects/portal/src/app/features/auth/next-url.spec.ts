import { describe, expect, it } from 'vitest';
import { HOME_URL } from '../../core/auth/guards';
import { nextUrl } from './next-url';

describe('nextUrl', () => {
  it.each([
    ['a proposal in this portal', '/portal/proposals/abc', '/proposals/abc'],
    ['a board with a query', '/portal/boards/b1?round=2', '/boards/b1?round=2'],
    ['the portal root', '/portal/', HOME_URL],
    ['nothing', undefined, HOME_URL],
    ['another site', 'https://example.com/portal/x', HOME_URL],
    ['a protocol-relative address', '//evil.example/portal/x', HOME_URL],
    ['a path that climbs out', '/portal/../admin', HOME_URL],
    ['an encoded climb', '/portal/%2e%2e/admin', HOME_URL],
    ['a backslash', '/portal/\\evil', HOME_URL],
    ['a doubled slash inside', '/portal//evil.example', HOME_URL],
    ['a path outside the portal', '/inquiries', HOME_URL],
    ['an overlong path', `/portal/${'a'.repeat(600)}`, HOME_URL],
  ])('sends %s to the right place', (_case, next, expected) => {
    expect(nextUrl(next)).toBe(expected);
  });
});
