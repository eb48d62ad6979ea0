import { Routes } from '@angular/router';
import { signedInGuard, signedOutGuard } from './core/auth/guards';

export const routes: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'projects' },
  {
    path: 'sign-in',
    title: 'Sign in · Layerbook client portal',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./features/auth/sign-in').then((m) => m.SignIn),
  },
  {
    path: 'sign-in/link',
    title: 'Signing you in · Layerbook client portal',
    loadComponent: () => import('./features/auth/sign-in-link').then((m) => m.SignInLink),
  },
  {
    path: '',
    canActivate: [signedInGuard],
    loadComponent: () => import('./core/layout/portal-shell').then((m) => m.PortalShell),
    children: [
      {
        path: 'projects',
        title: 'Your projects · Layerbook client portal',
        loadComponent: () => import('./features/projects/projects').then((m) => m.Projects),
      },
    ],
  },
  {
    path: '**',
    title: 'Page not found · Layerbook client portal',
    loadComponent: () => import('./shared/ui/not-found').then((m) => m.NotFound),
  },
];
