import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type {
  ClientCreate,
  ClientDetail,
  ClientMerge,
  ClientSummary,
  ClientUpdate,
  ContactCreate,
  ContactView,
  SiteCreate,
  SiteUpdate,
  SiteView,
} from '@layerbook/contracts/types';

/** The client and site changes; reads are resources in the pages that show them. */
@Injectable({ providedIn: 'root' })
export class ClientApi {
  private readonly http = inject(HttpClient);

  create(body: ClientCreate): Promise<ClientSummary> {
    return firstValueFrom(this.http.post<ClientSummary>('/api/clients', body));
  }

  update(id: string, body: ClientUpdate): Promise<ClientSummary> {
    return firstValueFrom(this.http.patch<ClientSummary>(clientUrl(id), body));
  }

  /** Moves everything of this client to `intoClientId` and removes this one; answers the kept client. */
  merge(id: string, body: ClientMerge): Promise<ClientDetail> {
    return firstValueFrom(this.http.post<ClientDetail>(`${clientUrl(id)}/merge`, body));
  }

  addContact(clientId: string, body: ContactCreate): Promise<ContactView> {
    return firstValueFrom(this.http.post<ContactView>(`${clientUrl(clientId)}/contacts`, body));
  }

  addSite(clientId: string, body: SiteCreate): Promise<SiteView> {
    return firstValueFrom(this.http.post<SiteView>(`${clientUrl(clientId)}/sites`, body));
  }

  updateSite(siteId: string, body: SiteUpdate): Promise<SiteView> {
    return firstValueFrom(this.http.patch<SiteView>(`/api/sites/${encodeURIComponent(siteId)}`, body));
  }
}

export function clientUrl(id: string): string {
  return `/api/clients/${encodeURIComponent(id)}`;
}
