import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { FinishSystemInput, FinishSystemSummary, FinishSystemUpdate, FinishSystemView, ProductInput, ProductUpdate, ProductView } from '@layerbook/contracts';

export type ArchivedFilter = 'exclude' | 'include' | 'only';

@Injectable({ providedIn: 'root' })
export class LibraryApi {
  private readonly http = inject(HttpClient);

  products(archived: ArchivedFilter = 'exclude'): Promise<ProductView[]> {
    return firstValueFrom(this.http.get<ProductView[]>('/api/library/products', { params: { archived } }));
  }

  createProduct(body: ProductInput): Promise<ProductView> {
    return firstValueFrom(this.http.post<ProductView>('/api/library/products', body));
  }

  updateProduct(id: string, body: ProductUpdate): Promise<ProductView> {
    return firstValueFrom(this.http.patch<ProductView>(`/api/library/products/${encodeURIComponent(id)}`, body));
  }

  setProductArchived(id: string, isArchived: boolean): Promise<ProductView> {
    return firstValueFrom(this.http.post<ProductView>(`/api/library/products/${encodeURIComponent(id)}/${isArchived ? 'archive' : 'unarchive'}`, {}));
  }

  systems(archived: ArchivedFilter = 'exclude'): Promise<FinishSystemSummary[]> {
    return firstValueFrom(this.http.get<FinishSystemSummary[]>('/api/library/systems', { params: { archived } }));
  }

  system(id: string): Promise<FinishSystemView> {
    return firstValueFrom(this.http.get<FinishSystemView>(`/api/library/systems/${encodeURIComponent(id)}`));
  }

  createSystem(body: FinishSystemInput): Promise<FinishSystemView> {
    return firstValueFrom(this.http.post<FinishSystemView>('/api/library/systems', body));
  }

  updateSystem(id: string, body: FinishSystemUpdate): Promise<FinishSystemView> {
    return firstValueFrom(this.http.patch<FinishSystemView>(`/api/library/systems/${encodeURIComponent(id)}`, body));
  }

  setSystemArchived(id: string, isArchived: boolean): Promise<FinishSystemView> {
    return firstValueFrom(this.http.post<FinishSystemView>(`/api/library/systems/${encodeURIComponent(id)}/${isArchived ? 'archive' : 'unarchive'}`, {}));
  }

  duplicateSystem(id: string): Promise<FinishSystemView> {
    return firstValueFrom(this.http.post<FinishSystemView>(`/api/library/systems/${encodeURIComponent(id)}/duplicate`, {}));
  }
}
