import { Routes } from '@angular/router';
import { roleGuard, signedInGuard } from './core/auth/guards';

export const routes: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'today' },
  { path: '', loadChildren: () => import('./features/auth/auth.routes') },
  {
    path: '',
    loadComponent: () => import('./core/layout/shell').then((m) => m.Shell),
    canActivate: [signedInGuard],
    children: [
      {
        path: 'today',
        title: 'layout.titles.today',
        loadComponent: () => import('./features/today/today').then((m) => m.Today),
      },
      {
        path: 'inquiries',
        canActivate: [roleGuard('office')],
        loadChildren: () => import('./features/inquiries/inquiries.routes'),
      },
      {
        path: 'clients',
        canActivate: [roleGuard('office')],
        loadChildren: () => import('./features/clients/clients.routes'),
      },
      {
        path: 'estimates',
        canActivate: [roleGuard('office')],
        loadChildren: () => import('./features/proposals/proposals.routes'),
      },
      {
        path: 'jobs',
        canActivate: [roleGuard('office')],
        loadChildren: () => import('./features/jobs/jobs.routes'),
      },
      {
        path: 'billing',
        canActivate: [roleGuard('office')],
        loadChildren: () => import('./features/billing/billing.routes'),
      },
      {
        path: 'cash',
        title: 'layout.titles.cash',
        canActivate: [roleGuard('office')],
        loadComponent: () => import('./features/cash/cash').then((m) => m.Cash),
      },
      {
        path: 'activity',
        title: 'audit.title',
        canActivate: [roleGuard('owner')],
        loadComponent: () => import('./features/audit/activity').then((m) => m.Activity),
      },
      {
        path: 'sheets',
        loadChildren: () => import('./features/jobs/sheet/sheet.routes'),
      },
      {
        path: 'samples',
        loadChildren: () => import('./features/samples/samples.routes'),
      },
      {
        path: 'library',
        loadChildren: () => import('./features/library/library.routes'),
      },
      {
        path: 'sites/:siteId/takeoff',
        canActivate: [roleGuard('office')],
        loadChildren: () => import('./features/takeoff/takeoff.routes'),
      },
      {
        path: 'team',
        title: 'layout.titles.team',
        loadComponent: () => import('./features/team/team').then((m) => m.Team),
      },
      {
        path: 'settings/billing',
        title: 'layout.titles.billingSettings',
        canActivate: [roleGuard('office')],
        loadComponent: () => import('./features/firms/billing-settings').then((m) => m.BillingSettingsPage),
      },
      {
        path: 'security',
        title: 'auth.titles.security',
        canActivate: [roleGuard('office')],
        loadComponent: () => import('./features/auth/second-factor/security-page').then((m) => m.SecurityPage),
      },
      {
        path: 'settings',
        title: 'layout.titles.settings',
        loadComponent: () => import('./features/firms/firm-settings').then((m) => m.FirmSettingsPage),
      },
    ],
  },
  {
    path: '**',
    title: 'layout.titles.notFound',
    loadComponent: () => import('./shared/ui/not-found').then((m) => m.NotFound),
  },
];
