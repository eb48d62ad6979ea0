import { Routes } from '@angular/router';

export default [
  {
    path: 'change-orders/:id',
    title: 'Change order · Layerbook client portal',
    loadComponent: () => import('./change-order-page').then((m) => m.ChangeOrderPage),
  },
] satisfies Routes;
