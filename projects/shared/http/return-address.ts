/** Where a person whose session ended is sent: the app's sign-in page, and back afterwards. */
export interface SignInRedirect {
  readonly path: string;
  /** The page they were on, written from the site root (`/jobs/7`, `/portal/proposals/7`). */
  readonly next: string;
}

/**
 * The sign-in address for someone whose session ended on `currentUrl` (a router URL). `next` is
 * written from the site root, as each app's sign-in reads it back (the portal's next-url.ts wants
 * `/portal/…`). Null when they are on the sign-in page already: there is nothing to return to.
 */
export function signInRedirect(currentUrl: string, signInPath: string, baseHref: string): SignInRedirect | null {
  const path = currentUrl.split(/[?#]/, 1)[0] ?? '';
  if (path === signInPath || path.startsWith(`${signInPath}/`)) {
    return null;
  }
  const root = baseHref.endsWith('/') ? baseHref.slice(0, -1) : baseHref;
  return { path: signInPath, next: `${root}${currentUrl.startsWith('/') ? '' : '/'}${currentUrl}` };
}
