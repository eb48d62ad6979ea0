import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { PublicInquiryRequest } from '@layerbook/contracts';

/** What GET /api/public/firms/:slug answers: enough to head the form, plus the signed form stamp. */
export interface PublicFirm {
  readonly name: string;
  readonly slug: string;
  readonly formStamp: string;
}

/** The form's body; `consent` is whatever the box says, and the API refuses anything but true. */
export type InquiryBody = Omit<PublicInquiryRequest, 'consent'> & { readonly consent: boolean };

/** The anonymous API behind a firm's public inquiry form: no session, no CSRF token. */
@Injectable({ providedIn: 'root' })
export class InquiryApi {
  private readonly http = inject(HttpClient);

  firm(slug: string): Promise<PublicFirm> {
    return firstValueFrom(this.http.get<PublicFirm>(`/api/public/firms/${encodeURIComponent(slug)}`));
  }

  async send(slug: string, body: InquiryBody): Promise<void> {
    await firstValueFrom(this.http.post(`/api/public/firms/${encodeURIComponent(slug)}/inquiries`, body));
  }
}
