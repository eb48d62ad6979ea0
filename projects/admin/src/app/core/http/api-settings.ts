import type { ApiSettings } from '../../../../../shared/http/api-settings';
import { Session } from '../auth/session';

/** The admin app's side of the API: staff sessions under /api/auth, served from the site root. */
export const API_SETTINGS: ApiSettings = {
  sessionUrl: '/api/auth/session',
  sessionCalls: ['/api/auth/'],
  signInPath: '/sign-in',
  baseHref: '/',
  session: Session,
};
