import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'Measure rooms · Layerbook',
    loadComponent: () => import('./takeoff-page').then((m) => m.TakeoffPage),
  },
] satisfies Routes;
