import { Routes } from '@angular/router';

/** Billing: /billing (the invoices) and /billing/invoices/:id (one invoice). */
export default [
  {
    path: '',
    pathMatch: 'full',
    title: 'Invoices · Layerbook',
    loadComponent: () => import('./invoice-list').then((m) => m.InvoiceList),
  },
  {
    path: 'invoices/:id',
    title: 'Invoice · Layerbook',
    loadComponent: () => import('./invoice-detail').then((m) => m.InvoiceDetailPage),
  },
] satisfies Routes;
