import { Routes } from '@angular/router';

/** Accepted jobs: /jobs. */
export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'Accepted jobs · Layerbook',
    loadComponent: () => import('./job-list').then((m) => m.JobList),
  },
  {
    path: ':id',
    title: 'Job · Layerbook',
    loadComponent: () => import('./job-detail').then((m) => m.JobDetail),
  },
] satisfies Routes;
