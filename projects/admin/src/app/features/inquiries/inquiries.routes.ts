import { Routes } from '@angular/router';

/** Board first: it is where an owner works the week; the table is for finding and sorting. */
export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'Inquiries · Layerbook',
    loadComponent: () => import('./inquiry-board').then((m) => m.InquiryBoard),
  },
  {
    path: 'list',
    title: 'Inquiries table · Layerbook',
    loadComponent: () => import('./inquiry-table').then((m) => m.InquiryTable),
  },
  {
    path: 'new',
    title: 'Log an inquiry · Layerbook',
    loadComponent: () => import('./new-inquiry').then((m) => m.NewInquiry),
  },
  {
    path: ':id',
    title: 'Inquiry · Layerbook',
    loadComponent: () => import('./inquiry-detail').then((m) => m.InquiryDetailPage),
  },
] satisfies Routes;
