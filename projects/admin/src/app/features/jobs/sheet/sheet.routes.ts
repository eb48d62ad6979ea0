import { Routes } from '@angular/router';

/** The crew's job sheets: the list of jobs, then one job's sheet (phone first). */
export default [
  { path: '', title: 'sheet.titles.list', loadComponent: () => import('./sheet-list').then((m) => m.SheetList) },
  { path: ':id', title: 'sheet.titles.sheet', loadComponent: () => import('./sheet-page').then((m) => m.SheetPage) },
] satisfies Routes;
