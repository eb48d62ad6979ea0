import { describe, expect, it } from 'vitest';
import { HOME_URL, safeNextUrl } from './guards';

// OWASP Unvalidated Redirects and Forwards Cheat Sheet: only same-site paths are followed.
describe('safeNextUrl', () => {
  it.each([
    ['/jobs/7?tab=photos', '/jobs/7?tab=photos'],
    ['/today', '/today'],
    [null, HOME_URL],
    [undefined, HOME_URL],
    ['', HOME_URL],
    ['jobs', HOME_URL],
    ['//evil.example/x', HOME_URL],
    ['/\\evil.example', HOME_URL],
    ['https://evil.example', HOME_URL],
  ])('follows %j to %j', (next, where) => {
    expect(safeNextUrl(next)).toBe(where);
  });
});
