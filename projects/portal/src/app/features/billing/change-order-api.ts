import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { ChangeOrderDecision, PortalChangeOrder } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';

/** One change order sent to the client, for the page's httpResource read. */
export const changeOrderUrl = (id: string) => `/api/portal/change-orders/${encodeURIComponent(id)}`;

/** The client's answer to a change order: approve with a typed signature, or decline. */
@Injectable({ providedIn: 'root' })
export class ChangeOrderApi {
  private readonly http = inject(HttpClient);

  decide(id: string, body: ChangeOrderDecision): Promise<PortalChangeOrder> {
    return firstValueFrom(this.http.post<PortalChangeOrder>(`${changeOrderUrl(id)}/decision`, body));
  }
}
