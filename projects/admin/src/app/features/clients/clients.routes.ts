import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'Clients · Layerbook',
    loadComponent: () => import('./client-list').then((m) => m.ClientList),
  },
  {
    path: 'new',
    title: 'New client · Layerbook',
    loadComponent: () => import('./new-client').then((m) => m.NewClient),
  },
  {
    path: ':id',
    title: 'Client · Layerbook',
    loadComponent: () => import('./client-detail').then((m) => m.ClientDetailPage),
  },
] satisfies Routes;
