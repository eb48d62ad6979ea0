import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type {
  ArchivedFilter,
  FinishSystemInput,
  FinishSystemUpdate,
  FinishSystemView,
  ItemList,
  ProductInput,
  ProductUpdate,
  ProductView,
} from '@layerbook/contracts/types';

const id = (value: string) => encodeURIComponent(value);

/** The library's lists, read by the pages through httpResource (one address each). */
export const LIBRARY_URLS = {
  products: '/api/library/products',
  systems: '/api/library/systems',
  system: (systemId: string) => `/api/library/systems/${id(systemId)}`,
} as const;

/** `?archived=` for a list that shows archived entries or not. */
export const archivedParam = (showArchived: boolean): { archived: ArchivedFilter } => ({ archived: showArchived ? 'include' : 'exclude' });

/** The library's writes (/api/library); each answers with what was saved. */
@Injectable({ providedIn: 'root' })
export class LibraryApi {
  private readonly http = inject(HttpClient);

  createProduct(body: ProductInput): Promise<ProductView> {
    return firstValueFrom(this.http.post<ProductView>(LIBRARY_URLS.products, body));
  }

  updateProduct(productId: string, body: ProductUpdate): Promise<ProductView> {
    return firstValueFrom(this.http.patch<ProductView>(`${LIBRARY_URLS.products}/${id(productId)}`, body));
  }

  setProductArchived(productId: string, isArchived: boolean): Promise<ProductView> {
    return firstValueFrom(
      this.http.post<ProductView>(`${LIBRARY_URLS.products}/${id(productId)}/${isArchived ? 'archive' : 'unarchive'}`, {}),
    );
  }

  /** The current products, for the layer editor's pickers. */
  async products(): Promise<readonly ProductView[]> {
    return (await firstValueFrom(this.http.get<ItemList<ProductView>>(LIBRARY_URLS.products, { params: archivedParam(false) }))).items;
  }

  system(systemId: string): Promise<FinishSystemView> {
    return firstValueFrom(this.http.get<FinishSystemView>(LIBRARY_URLS.system(systemId)));
  }

  createSystem(body: FinishSystemInput): Promise<FinishSystemView> {
    return firstValueFrom(this.http.post<FinishSystemView>(LIBRARY_URLS.systems, body));
  }

  updateSystem(systemId: string, body: FinishSystemUpdate): Promise<FinishSystemView> {
    return firstValueFrom(this.http.patch<FinishSystemView>(LIBRARY_URLS.system(systemId), body));
  }

  setSystemArchived(systemId: string, isArchived: boolean): Promise<FinishSystemView> {
    return firstValueFrom(this.http.post<FinishSystemView>(`${LIBRARY_URLS.system(systemId)}/${isArchived ? 'archive' : 'unarchive'}`, {}));
  }

  duplicateSystem(systemId: string): Promise<FinishSystemView> {
    return firstValueFrom(this.http.post<FinishSystemView>(`${LIBRARY_URLS.system(systemId)}/duplicate`, {}));
  }
}
