import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { Notice, PublicFirm, PublicInquiryRequest } from '@layerbook/contracts/types';

/** The form's body; `consent` is whatever the box says, and the API refuses anything but true. */
export type InquiryBody = Omit<PublicInquiryRequest, 'consent'> & { readonly consent: boolean };

/** The anonymous API behind a firm's public inquiry form: no session, no CSRF token. */
@Injectable({ providedIn: 'root' })
export class InquiryApi {
  private readonly http = inject(HttpClient);

  firm(slug: string): Promise<PublicFirm> {
    return firstValueFrom(this.http.get<PublicFirm>(firmUrl(slug)));
  }

  send(slug: string, body: InquiryBody): Promise<Notice> {
    return firstValueFrom(this.http.post<Notice>(`${firmUrl(slug)}/inquiries`, body));
  }
}

function firmUrl(slug: string): string {
  return `/api/public/firms/${encodeURIComponent(slug)}`;
}
