import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { nextUrl } from '../../features/auth/next-url';
import { Session } from './session';

export { HOME_URL } from './home-url';

/** Clients without a session are sent to ask for a sign-in link, which brings them back to this page. */
export const signedInGuard: CanActivateFn = async (_route, state) => {
  const router = inject(Router);
  const client = await inject(Session).load();
  return client ? true : router.createUrlTree(['/sign-in'], { queryParams: { next: `/portal${state.url}` } });
};

/**
 * A signed-in client who opens the sign-in page goes straight on: to the page it was asked for
 * (`next`, e.g. from an e-mailed link they clicked twice), else to their projects.
 */
export const signedOutGuard: CanActivateFn = async (route) => {
  const router = inject(Router);
  const client = await inject(Session).load();
  return client ? router.parseUrl(nextUrl(route.queryParamMap.get('next'))) : true;
};
