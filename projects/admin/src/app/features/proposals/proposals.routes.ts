import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'Estimates · Layerbook',
    loadComponent: () => import('./estimate-list').then((m) => m.EstimateList),
  },
  {
    path: 'new',
    title: 'New estimate · Layerbook',
    loadComponent: () => import('./new-estimate').then((m) => m.NewEstimate),
  },
  {
    path: ':id',
    title: 'Estimate · Layerbook',
    loadComponent: () => import('./estimate-builder').then((m) => m.EstimateBuilder),
  },
  {
    path: ':id/proposals',
    title: 'Proposals · Layerbook',
    loadComponent: () => import('./proposal-versions').then((m) => m.ProposalVersions),
  },
] satisfies Routes;
