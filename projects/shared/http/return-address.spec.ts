import { describe, expect, it } from 'vitest';
import { signInRedirect } from './return-address';

// common practice, no source: the way back is the page the person was on, from the site root.
describe('signInRedirect', () => {
  it.each([
    // current router URL, sign-in path, base href, expected
    ['/jobs/7?tab=photos', '/sign-in', '/', { path: '/sign-in', next: '/jobs/7?tab=photos' }],
    ['/today', '/sign-in', '/', { path: '/sign-in', next: '/today' }],
    ['/proposals/abc', '/sign-in', '/portal/', { path: '/sign-in', next: '/portal/proposals/abc' }],
    ['/boards/1#photos', '/sign-in', '/portal', { path: '/sign-in', next: '/portal/boards/1#photos' }],
    ['/', '/sign-in', '/portal/', { path: '/sign-in', next: '/portal/' }],
    ['projects', '/sign-in', '/portal/', { path: '/sign-in', next: '/portal/projects' }],
  ])('%s in %s under %s', (current, signIn, base, expected) => {
    expect(signInRedirect(current, signIn, base)).toEqual(expected);
  });

  it.each([['/sign-in'], ['/sign-in?next=%2Fjobs'], ['/sign-in/link?token=x'], ['/sign-in#top']])(
    'stays put on the sign-in page (%s)',
    (current) => {
      expect(signInRedirect(current, '/sign-in', '/')).toBeNull();
    },
  );

  it('does not mistake a page that only starts like the sign-in path for it', () => {
    expect(signInRedirect('/sign-in-help', '/sign-in', '/')).toEqual({
      path: '/sign-in',
      next: '/sign-in-help',
    });
  });
});
