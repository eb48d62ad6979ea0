import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'Jobs & proposals · Layerbook',
    loadComponent: () => import('./estimate-list').then((m) => m.EstimateList),
  },
  {
    path: 'estimates/new',
    title: 'New estimate · Layerbook',
    loadComponent: () => import('./new-estimate').then((m) => m.NewEstimate),
  },
  {
    path: 'estimates/:id',
    title: 'Estimate · Layerbook',
    loadComponent: () => import('./estimate-builder').then((m) => m.EstimateBuilder),
  },
  {
    path: 'estimates/:id/proposals',
    title: 'Proposals · Layerbook',
    loadComponent: () => import('./proposal-versions').then((m) => m.ProposalVersions),
  },
  // Accepted jobs live in their own feature folder; /jobs is where the office finds them.
  {
    path: 'work',
    loadChildren: () => import('../jobs/jobs.routes'),
  },
] satisfies Routes;
