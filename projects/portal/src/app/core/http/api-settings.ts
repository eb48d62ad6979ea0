import type { ApiSettings } from '../../../../../shared/http/api-settings';
import { Session } from '../auth/session';

/** The portal's side of the API: client sessions under /api/portal, served under /portal/. */
export const API_SETTINGS: ApiSettings = {
  sessionUrl: '/api/portal/session',
  sessionCalls: ['/api/portal/session', '/api/portal/auth/'],
  signInPath: '/sign-in',
  baseHref: '/portal/',
  session: Session,
};
