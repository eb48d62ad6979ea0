import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type {
  BillingScheduleUpdate,
  InvoiceDetail,
  InvoiceDraftCreate,
  JobBillingView,
  JobProgressView,
  ProgressMark,
  ValueLinesUpdate,
} from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';

/** The job page's billing writes; what it shows is read by resources in the components. */
@Injectable({ providedIn: 'root' })
export class JobBillingApi {
  private readonly http = inject(HttpClient);

  private url(jobId: string, rest: string): string {
    return `/api/jobs/${encodeURIComponent(jobId)}/${rest}`;
  }

  saveSchedule(jobId: string, update: BillingScheduleUpdate): Promise<JobBillingView> {
    return firstValueFrom(this.http.put<JobBillingView>(this.url(jobId, 'billing/schedule'), update));
  }

  startBilling(jobId: string): Promise<JobBillingView> {
    return firstValueFrom(this.http.post<JobBillingView>(this.url(jobId, 'billing/start'), {}));
  }

  saveValueLines(jobId: string, update: ValueLinesUpdate): Promise<JobBillingView> {
    return firstValueFrom(this.http.put<JobBillingView>(this.url(jobId, 'billing/value-lines'), update));
  }

  /** One mark from the work; the answer carries no money, so callers read the billing view again. */
  markProgress(jobId: string, mark: ProgressMark): Promise<JobProgressView> {
    return firstValueFrom(this.http.post<JobProgressView>(this.url(jobId, 'progress'), mark));
  }

  draftInvoice(jobId: string, draft: InvoiceDraftCreate): Promise<InvoiceDetail> {
    return firstValueFrom(this.http.post<InvoiceDetail>(this.url(jobId, 'invoices'), draft));
  }
}
