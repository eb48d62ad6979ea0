import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'takeoff.titles.page',
    loadComponent: () => import('./takeoff-page').then((m) => m.TakeoffPage),
  },
] satisfies Routes;
