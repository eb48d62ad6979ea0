import { Routes } from '@angular/router';

/** Accepted jobs: /jobs. */
export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'jobs.titles.list',
    loadComponent: () => import('./job-list').then((m) => m.JobList),
  },
  {
    path: ':id',
    title: 'jobs.titles.detail',
    loadComponent: () => import('./job-detail').then((m) => m.JobDetail),
  },
] satisfies Routes;
