import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'clients.titles.list',
    loadComponent: () => import('./client-list').then((m) => m.ClientList),
  },
  {
    path: 'new',
    title: 'clients.titles.new',
    loadComponent: () => import('./new-client').then((m) => m.NewClient),
  },
  {
    path: ':id',
    title: 'clients.titles.detail',
    loadComponent: () => import('./client-detail').then((m) => m.ClientDetailPage),
  },
] satisfies Routes;
