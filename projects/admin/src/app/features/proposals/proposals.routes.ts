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
] satisfies Routes;
