import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { InvoiceDetail, InvoiceDraftUpdate, InvoiceIssue, InvoiceVoid, OfflinePaymentCreate } from '@layerbook/contracts/types';

export const INVOICES_URL = '/api/invoices';

const invoiceUrl = (id: string): string => `${INVOICES_URL}/${encodeURIComponent(id)}`;

/** An invoice's changes: review a draft, issue it, void it, record what was paid. Each answers the whole invoice. */
@Injectable({ providedIn: 'root' })
export class InvoiceApi {
  private readonly http = inject(HttpClient);

  update(id: string, body: InvoiceDraftUpdate): Promise<InvoiceDetail> {
    return firstValueFrom(this.http.patch<InvoiceDetail>(invoiceUrl(id), body));
  }

  deleteDraft(id: string): Promise<unknown> {
    return firstValueFrom(this.http.delete(invoiceUrl(id)));
  }

  issue(id: string, body: InvoiceIssue): Promise<InvoiceDetail> {
    return firstValueFrom(this.http.post<InvoiceDetail>(`${invoiceUrl(id)}/issue`, body));
  }

  void(id: string, body: InvoiceVoid): Promise<InvoiceDetail> {
    return firstValueFrom(this.http.post<InvoiceDetail>(`${invoiceUrl(id)}/void`, body));
  }

  recordPayment(id: string, body: OfflinePaymentCreate): Promise<InvoiceDetail> {
    return firstValueFrom(this.http.post<InvoiceDetail>(`${invoiceUrl(id)}/payments`, body));
  }
}

/** Plain links: the browser downloads the PDF with the session cookie. */
export const invoicePdfHref = (id: string): string => `${invoiceUrl(id)}/pdf`;
export const creditNotePdfHref = (id: string): string => `/api/credit-notes/${encodeURIComponent(id)}/pdf`;
