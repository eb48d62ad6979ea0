import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { Session } from './session';

export const HOME_URL = '/projects';

/** Clients without a session are sent to ask for a sign-in link, which brings them back to this page. */
export const signedInGuard: CanActivateFn = async (_route, state) => {
  const router = inject(Router);
  const client = await inject(Session).load();
  return client ? true : router.createUrlTree(['/sign-in'], { queryParams: { next: `/portal${state.url}` } });
};

/** A signed-in client who opens the sign-in page goes straight to their projects. */
export const signedOutGuard: CanActivateFn = async () => {
  const router = inject(Router);
  const client = await inject(Session).load();
  return client ? router.parseUrl(HOME_URL) : true;
};
