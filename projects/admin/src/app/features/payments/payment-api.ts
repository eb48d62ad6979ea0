import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { RefundCreate, RefundView } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';

export const PAYMENTS_URL = '/api/payments';

const paymentUrl = (id: string): string => `${PAYMENTS_URL}/${encodeURIComponent(id)}`;

/** A payment's refunds: back to the card online, or money already given back by cheque, transfer or cash. */
@Injectable({ providedIn: 'root' })
export class PaymentApi {
  private readonly http = inject(HttpClient);

  refund(paymentId: string, body: RefundCreate): Promise<RefundView> {
    return firstValueFrom(this.http.post<RefundView>(`${paymentUrl(paymentId)}/refunds`, body));
  }

  /** A card refund still being sent back: the card processor is asked about it again (the same refund, never a second one). */
  sendAgain(refundId: string): Promise<RefundView> {
    return firstValueFrom(this.http.post<RefundView>(`${PAYMENTS_URL}/refunds/${encodeURIComponent(refundId)}/send`, {}));
  }
}

/** Plain links: the browser downloads the receipt with the session cookie. */
export const paymentReceiptHref = (paymentId: string): string => `${paymentUrl(paymentId)}/receipt.pdf`;
export const refundReceiptHref = (refundId: string): string => `${PAYMENTS_URL}/refunds/${encodeURIComponent(refundId)}/receipt.pdf`;
