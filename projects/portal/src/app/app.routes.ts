import { EnvironmentInjector, inject, runInInjectionContext } from '@angular/core';
import { ResolveFn, Routes } from '@angular/router';
import { signedInGuard, signedOutGuard } from './core/auth/guards';
import type { FirmLookup } from './features/inquiry/firm-lookup';

type FirmLookupModule = typeof import('./features/inquiry/firm-lookup');

/** A resolver whose code loads with the page that needs it, not with every page's first load. */
function lazyResolver(pick: (module: FirmLookupModule) => ResolveFn<FirmLookup>): ResolveFn<FirmLookup> {
  return (route, state) => {
    const injector = inject(EnvironmentInjector);
    return import('./features/inquiry/firm-lookup').then((module) =>
      // Both firm-lookup resolvers answer with a promise.
      runInInjectionContext(injector, () => pick(module)(route, state) as Promise<FirmLookup>),
    );
  };
}
const firmLookupResolver = lazyResolver((module) => module.firmLookupResolver);
const firmNameResolver = lazyResolver((module) => module.firmNameResolver);

export const routes: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'projects' },
  {
    path: 'sign-in',
    title: 'layout.titles.signIn',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./features/auth/sign-in').then((m) => m.SignIn),
  },
  {
    path: 'sign-in/link',
    title: 'layout.titles.signingIn',
    loadComponent: () => import('./features/auth/sign-in-link').then((m) => m.SignInLink),
  },
  // A firm's public inquiry form: no sign-in; the page title names the firm (set by the page).
  {
    path: 'f/:slug/inquiry',
    resolve: { lookup: firmLookupResolver },
    loadComponent: () => import('./features/inquiry/inquiry-page').then((m) => m.InquiryPage),
  },
  {
    path: 'f/:slug/inquiry/thanks',
    resolve: { lookup: firmNameResolver },
    loadComponent: () => import('./features/inquiry/inquiry-thanks').then((m) => m.InquiryThanks),
  },
  {
    path: '',
    canActivate: [signedInGuard],
    loadComponent: () => import('./core/layout/portal-shell').then((m) => m.PortalShell),
    children: [
      {
        path: 'projects',
        title: 'layout.titles.projects',
        loadComponent: () => import('./features/home/home-page').then((m) => m.HomePage),
      },
      {
        path: 'boards',
        loadChildren: () => import('./features/samples/samples.routes'),
      },
      {
        path: 'proposals/:id',
        title: 'layout.titles.proposal',
        loadComponent: () => import('./features/proposals/proposal-page').then((m) => m.ProposalPage),
      },
      // The client's billing: change orders to approve (and invoices, statements).
      { path: '', loadChildren: () => import('./features/billing/billing.routes') },
    ],
  },
  {
    path: '**',
    title: 'layout.titles.notFound',
    loadComponent: () => import('./shared/ui/not-found').then((m) => m.NotFound),
  },
];
