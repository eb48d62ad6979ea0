import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { ChangeOrderCreate, ChangeOrderUpdate, ChangeOrderView } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';

/** A job's change orders, for the resources that read them. */
export const changeOrdersUrl = (jobId: string) => `/api/jobs/${encodeURIComponent(jobId)}/change-orders`;
export const changeOrderUrl = (id: string) => `/api/change-orders/${encodeURIComponent(id)}`;

/** The office's writes: add a draft, change it, send it to the client. */
@Injectable({ providedIn: 'root' })
export class ChangeOrderApi {
  private readonly http = inject(HttpClient);

  get(id: string): Promise<ChangeOrderView> {
    return firstValueFrom(this.http.get<ChangeOrderView>(changeOrderUrl(id)));
  }

  create(jobId: string, body: ChangeOrderCreate): Promise<ChangeOrderView> {
    return firstValueFrom(this.http.post<ChangeOrderView>(changeOrdersUrl(jobId), body));
  }

  update(id: string, body: ChangeOrderUpdate): Promise<ChangeOrderView> {
    return firstValueFrom(this.http.patch<ChangeOrderView>(changeOrderUrl(id), body));
  }

  send(id: string): Promise<ChangeOrderView> {
    return firstValueFrom(this.http.post<ChangeOrderView>(`${changeOrderUrl(id)}/send`, {}));
  }
}
