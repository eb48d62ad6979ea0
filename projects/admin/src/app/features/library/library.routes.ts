import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'library.titles.systems',
    data: { tab: 'systems' },
    loadComponent: () => import('./library-page').then((m) => m.LibraryPage),
  },
  {
    path: 'products',
    title: 'library.titles.products',
    data: { tab: 'products' },
    loadComponent: () => import('./library-page').then((m) => m.LibraryPage),
  },
  {
    path: 'systems/new',
    title: 'library.titles.newSystem',
    loadComponent: () => import('./system-editor').then((m) => m.SystemEditor),
  },
  {
    path: 'systems/:id',
    title: 'library.titles.system',
    loadComponent: () => import('./system-editor').then((m) => m.SystemEditor),
  },
] satisfies Routes;
