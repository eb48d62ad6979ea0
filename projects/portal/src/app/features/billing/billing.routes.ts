import { Routes } from '@angular/router';

export default [
  {
    path: 'invoices',
    title: 'Your invoices · Layerbook client portal',
    loadComponent: () => import('./invoice-list').then((m) => m.InvoiceList),
  },
  {
    path: 'invoices/:id',
    title: 'Invoice · Layerbook client portal',
    loadComponent: () => import('./invoice-page').then((m) => m.InvoicePage),
  },
  // The card page sends the client back here after paying.
  {
    path: 'invoices/:id/payment/:checkoutId',
    title: 'Your payment · Layerbook client portal',
    loadComponent: () => import('../payments/payment-return-page').then((m) => m.PaymentReturnPage),
  },
  {
    path: 'jobs/:id/statement',
    title: 'Statement · Layerbook client portal',
    loadComponent: () => import('./statement-page').then((m) => m.StatementPage),
  },
  {
    path: 'change-orders/:id',
    title: 'Change order · Layerbook client portal',
    loadComponent: () => import('./change-order-page').then((m) => m.ChangeOrderPage),
  },
] satisfies Routes;
