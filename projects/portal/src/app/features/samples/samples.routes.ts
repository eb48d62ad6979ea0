import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'Your sample boards · Layerbook client portal',
    loadComponent: () => import('./board-list').then((m) => m.BoardList),
  },
  { path: ':id', title: 'Sample board · Layerbook client portal', loadComponent: () => import('./board-page').then((m) => m.BoardPage) },
] satisfies Routes;
