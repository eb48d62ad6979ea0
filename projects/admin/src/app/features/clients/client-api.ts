import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, firstValueFrom } from 'rxjs';
import type {
  ClientCreate,
  ClientDetail,
  ClientKind,
  ClientSummary,
  ContactCreate,
  ContactView,
  Page,
  SiteCreate,
  SiteView,
} from '@layerbook/contracts';

export interface ClientFilters {
  readonly q: string;
  readonly kind: ClientKind | null;
}

@Injectable({ providedIn: 'root' })
export class ClientApi {
  private readonly http = inject(HttpClient);

  list(filters: ClientFilters, after: string | null = null): Observable<Page<ClientSummary>> {
    let params = new HttpParams().set('limit', 50);
    if (filters.q.trim()) {
      params = params.set('q', filters.q.trim());
    }
    if (filters.kind) {
      params = params.set('kind', filters.kind);
    }
    if (after) {
      params = params.set('after', after);
    }
    return this.http.get<Page<ClientSummary>>('/api/clients', { params });
  }

  get(id: string): Promise<ClientDetail> {
    return firstValueFrom(this.http.get<ClientDetail>(`/api/clients/${encodeURIComponent(id)}`));
  }

  create(body: ClientCreate): Promise<ClientSummary> {
    return firstValueFrom(this.http.post<ClientSummary>('/api/clients', body));
  }

  update(id: string, body: Partial<ClientCreate>): Promise<ClientSummary> {
    return firstValueFrom(this.http.patch<ClientSummary>(`/api/clients/${encodeURIComponent(id)}`, body));
  }

  addContact(clientId: string, body: ContactCreate): Promise<ContactView> {
    return firstValueFrom(
      this.http.post<ContactView>(`/api/clients/${encodeURIComponent(clientId)}/contacts`, body),
    );
  }

  addSite(clientId: string, body: SiteCreate): Promise<SiteView> {
    return firstValueFrom(this.http.post<SiteView>(`/api/clients/${encodeURIComponent(clientId)}/sites`, body));
  }

  updateSite(siteId: string, body: Partial<SiteCreate>): Promise<SiteView> {
    return firstValueFrom(this.http.patch<SiteView>(`/api/sites/${encodeURIComponent(siteId)}`, body));
  }
}
