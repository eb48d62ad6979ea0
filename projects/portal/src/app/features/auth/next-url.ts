import { HOME_URL } from '../../core/auth/home-url';

const PORTAL_PREFIX = '/portal/';

/**
 * Where to go after signing in: the link's `next` when it is a path inside this portal
 * (`/portal/…`, same origin), as a router URL without the `/portal` base; home otherwise.
 * Anything that could leave the site (`//host`, `/portal/../`, backslashes, schemes) goes home.
 */
export function nextUrl(next: string | null | undefined): string {
  if (typeof next !== 'string' || !next.startsWith(PORTAL_PREFIX) || next.length > 500) {
    return HOME_URL;
  }
  if (/[\\\s]|\/\/|(^|\/)\.\.?(\/|$)|%2e|%2f|%5c/i.test(next)) {
    return HOME_URL;
  }
  const path = next.slice(PORTAL_PREFIX.length - 1);
  return path === '/' ? HOME_URL : path;
}
