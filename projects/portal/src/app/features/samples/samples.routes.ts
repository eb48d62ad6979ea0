import { Routes } from '@angular/router';

export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'layout.titles.boards',
    loadComponent: () => import('./board-list').then((m) => m.BoardList),
  },
  { path: ':id', title: 'layout.titles.board', loadComponent: () => import('./board-page').then((m) => m.BoardPage) },
] satisfies Routes;
