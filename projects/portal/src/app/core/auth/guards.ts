import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { Session } from './session';

export const HOME_URL = '/projects';

/** Clients without a session are sent to ask for a sign-in link. */
export const signedInGuard: CanActivateFn = async () => {
  const router = inject(Router);
  const client = await inject(Session).load();
  return client ? true : router.parseUrl('/sign-in');
};

/** A signed-in client who opens the sign-in page goes straight to their projects. */
export const signedOutGuard: CanActivateFn = async () => {
  const router = inject(Router);
  const client = await inject(Session).load();
  return client ? router.parseUrl(HOME_URL) : true;
};
