import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import type { StaffRole, StaffSession } from '@layerbook/contracts/types';
import { Session } from './session';

export const HOME_URL = '/today';

/**
 * Where to go after an answer that may sign in: the second-factor step when the server asks for one
 * (a code, or setting one up because the firm requires it), carrying `next`; else `next` itself.
 */
export function urlAfterSignIn(session: StaffSession, next: string = HOME_URL): string {
  const step = session.secondFactor?.step;
  if (!step) return next;
  const path = step === 'code' ? '/sign-in/code' : '/sign-in/set-up';
  return next === HOME_URL ? path : `${path}?next=${encodeURIComponent(next)}`;
}

/** Signed-out visitors go to the sign-in page and come back here afterwards. */
export const signedInGuard: CanActivateFn = async (_route, state) => {
  const router = inject(Router);
  const user = await inject(Session).load();
  return user ? true : router.createUrlTree(['/sign-in'], { queryParams: { next: state.url } });
};

/** Sign-in and sign-up make no sense when someone is already signed in. */
export const signedOutGuard: CanActivateFn = async () => {
  const router = inject(Router);
  const user = await inject(Session).load();
  return user ? router.parseUrl(HOME_URL) : true;
};

/** Hides whole areas from roles that the server would refuse anyway (e.g. money pages for crew). */
export function roleGuard(needed: StaffRole): CanActivateFn {
  return async () => {
    const session = inject(Session);
    const router = inject(Router);
    await session.load();
    return session.hasRole(needed) ? true : router.parseUrl(HOME_URL);
  };
}

/** Only same-site paths are followed after sign-in, so a crafted link cannot send people away. */
export function safeNextUrl(next: string | null | undefined): string {
  return next && next.startsWith('/') && !next.startsWith('//') && !next.startsWith('/\\') ? next : HOME_URL;
}
