import { Routes } from '@angular/router';

/** Board first: it is where an owner works the week; the table is for finding and sorting. */
export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'inquiries.titles.board',
    loadComponent: () => import('./inquiry-board').then((m) => m.InquiryBoard),
  },
  {
    path: 'list',
    title: 'inquiries.titles.table',
    loadComponent: () => import('./inquiry-table').then((m) => m.InquiryTable),
  },
  {
    path: 'new',
    title: 'inquiries.titles.new',
    loadComponent: () => import('./new-inquiry').then((m) => m.NewInquiry),
  },
  {
    path: ':id',
    title: 'inquiries.titles.detail',
    loadComponent: () => import('./inquiry-detail').then((m) => m.InquiryDetailPage),
  },
] satisfies Routes;
