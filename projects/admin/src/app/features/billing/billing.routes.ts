import { Routes } from '@angular/router';

/** Billing: /billing (the invoices) and /billing/invoices/:id (one invoice). */
export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'billing.titles.list',
    loadComponent: () => import('./invoice-list').then((m) => m.InvoiceList),
  },
  {
    path: 'invoices/:id',
    title: 'billing.titles.detail',
    loadComponent: () => import('./invoice-detail').then((m) => m.InvoiceDetailPage),
  },
] satisfies Routes;
