import { Routes } from '@angular/router';

export default [
  {
    path: 'invoices',
    title: 'layout.titles.invoices',
    loadComponent: () => import('./invoice-list').then((m) => m.InvoiceList),
  },
  {
    path: 'invoices/:id',
    title: 'layout.titles.invoice',
    loadComponent: () => import('./invoice-page').then((m) => m.InvoicePage),
  },
  // The card page sends the client back here after paying.
  {
    path: 'invoices/:id/payment/:checkoutId',
    title: 'layout.titles.payment',
    loadComponent: () => import('../payments/payment-return-page').then((m) => m.PaymentReturnPage),
  },
  {
    path: 'jobs/:id/statement',
    title: 'layout.titles.statement',
    loadComponent: () => import('./statement-page').then((m) => m.StatementPage),
  },
  {
    path: 'change-orders/:id',
    title: 'layout.titles.changeOrder',
    loadComponent: () => import('./change-order-page').then((m) => m.ChangeOrderPage),
  },
] satisfies Routes;
