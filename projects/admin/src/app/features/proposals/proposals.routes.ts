import { Routes } from '@angular/router';
import { confirmLeaveUnsaved } from './leave-estimate-guard';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'proposals.titles.estimates',
    loadComponent: () => import('./estimate-list').then((m) => m.EstimateList),
  },
  {
    path: 'new',
    title: 'proposals.titles.newEstimate',
    loadComponent: () => import('./new-estimate').then((m) => m.NewEstimate),
  },
  {
    path: ':id',
    title: 'proposals.titles.estimate',
    canDeactivate: [confirmLeaveUnsaved],
    loadComponent: () => import('./estimate-builder').then((m) => m.EstimateBuilder),
  },
  {
    path: ':id/proposals',
    title: 'proposals.titles.proposals',
    loadComponent: () => import('./proposal-versions').then((m) => m.ProposalVersions),
  },
] satisfies Routes;
