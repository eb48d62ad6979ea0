import { DOCUMENT } from '@angular/common';
import { HttpClient } from '@angular/common/http';
import { InjectionToken, Injectable, inject } from '@angular/core';
import type { CheckoutStart, PortalInvoiceDetail } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';

const invoicePath = (invoiceId: string) => `/api/portal/invoices/${encodeURIComponent(invoiceId)}`;

/** Where a checkout started from the portal stands (CheckoutStatus), for the return page's reads. */
export const checkoutStatusUrl = (invoiceId: string, checkoutId: string) =>
  `${invoicePath(invoiceId)}/checkout/${encodeURIComponent(checkoutId)}`;

/** The client's receipts as PDFs: one per payment, one per refund. */
export const paymentReceiptUrl = (paymentId: string) => `/api/portal/payments/${encodeURIComponent(paymentId)}/receipt.pdf`;
export const refundReceiptUrl = (refundId: string) => `/api/portal/refunds/${encodeURIComponent(refundId)}/receipt.pdf`;

/** Paying an invoice by card: the server opens a checkout at the card processor and answers where to send the browser. */
@Injectable({ providedIn: 'root' })
export class PaymentApi {
  private readonly http = inject(HttpClient);

  startCheckout(invoiceId: string): Promise<CheckoutStart> {
    return firstValueFrom(this.http.post<CheckoutStart>(`${invoicePath(invoiceId)}/checkout`, {}));
  }

  /** The invoice read again, as it stands now (after a card payment was refused because it changed). */
  invoice(invoiceId: string): Promise<PortalInvoiceDetail> {
    return firstValueFrom(this.http.get<PortalInvoiceDetail>(invoicePath(invoiceId)));
  }
}

/** Sends the browser to another site's page (the processor's card page); tests replace it. */
export const LEAVE_FOR = new InjectionToken<(url: string) => void>('LEAVE_FOR', {
  providedIn: 'root',
  factory: () => {
    const view = inject(DOCUMENT).defaultView;
    return (url: string) => view?.location.assign(url);
  },
});
