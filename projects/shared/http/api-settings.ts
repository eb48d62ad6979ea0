import type { ProviderToken } from '@angular/core';

/** What an app's session service must offer the interceptor: forgetting who was signed in. */
export interface ForgettableSession {
  accept(session: null): unknown;
}

/** How one app talks to our API: what differs between admin and portal, and nothing else. */
export interface ApiSettings {
  /** The session probe; it also hands out the CSRF token a write needs. */
  readonly sessionUrl: string;
  /**
   * Calls whose answer is about the session itself (the probe, sign-in, sign-out, links): never
   * replayed from the server-rendered page (their CSRF token is bound to the browser's cookie),
   * and a 401 from them is an answer for the page to show, not an expired session.
   */
  readonly sessionCalls: readonly string[];
  /** The app's sign-in page, as a router path. */
  readonly signInPath: string;
  /** Where the app is served (`/` or `/portal/`): the `next` address is written from the site root. */
  readonly baseHref: string;
  /** The app's session service, told to forget the user when the API says the session is over. */
  readonly session: ProviderToken<ForgettableSession>;
}

export const API_PREFIX = '/api/';
/** Anonymous endpoints (the public inquiry form): no session, no cookie, so no CSRF token either. */
export const PUBLIC_API_PREFIX = '/api/public/';

export function isSessionCall(url: string, settings: Pick<ApiSettings, 'sessionCalls'>): boolean {
  return settings.sessionCalls.some((prefix) => url.startsWith(prefix));
}
