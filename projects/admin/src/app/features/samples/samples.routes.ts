import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'samples.titles.list',
    loadComponent: () => import('./sample-list').then((m) => m.SampleList),
  },
  { path: 'new', title: 'samples.titles.new', loadComponent: () => import('./new-sample').then((m) => m.NewSample) },
  { path: ':id', title: 'samples.titles.board', loadComponent: () => import('./sample-detail').then((m) => m.SampleDetail) },
] satisfies Routes;
