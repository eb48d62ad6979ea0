import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'Sample boards · Layerbook',
    loadComponent: () => import('./sample-list').then((m) => m.SampleList),
  },
  { path: 'new', title: 'New sample board · Layerbook', loadComponent: () => import('./new-sample').then((m) => m.NewSample) },
  { path: ':id', title: 'Sample board · Layerbook', loadComponent: () => import('./sample-detail').then((m) => m.SampleDetail) },
] satisfies Routes;
