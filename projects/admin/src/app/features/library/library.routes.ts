import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'Finish library · Layerbook',
    data: { tab: 'systems' },
    loadComponent: () => import('./library-page').then((m) => m.LibraryPage),
  },
  {
    path: 'products',
    title: 'Products · Finish library · Layerbook',
    data: { tab: 'products' },
    loadComponent: () => import('./library-page').then((m) => m.LibraryPage),
  },
  {
    path: 'systems/new',
    title: 'New finish system · Layerbook',
    loadComponent: () => import('./system-editor').then((m) => m.SystemEditor),
  },
  {
    path: 'systems/:id',
    title: 'Finish system · Layerbook',
    loadComponent: () => import('./system-editor').then((m) => m.SystemEditor),
  },
] satisfies Routes;
