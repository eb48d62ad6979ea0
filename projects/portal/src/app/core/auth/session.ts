import { HttpClient } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { PortalSession } from '@layerbook/contracts/types';

export type PortalClient = NonNullable<PortalSession['client']>;

/** Which client is signed in to the portal. `undefined` until the first session answer arrives. */
@Injectable({ providedIn: 'root' })
export class Session {
  private readonly http = inject(HttpClient);
  private readonly current = signal<PortalClient | null | undefined>(undefined);
  private pending: Promise<PortalClient | null> | null = null;

  readonly client = computed(() => this.current() ?? null);

  /** Loads the session once; an unreachable API counts as signed out so the sign-in page still renders. */
  load(): Promise<PortalClient | null> {
    const known = this.current();
    if (known !== undefined) {
      return Promise.resolve(known);
    }
    this.pending ??= firstValueFrom(this.http.get<PortalSession>('/api/portal/session'))
      .then(
        (session) => this.accept(session),
        () => this.accept(null),
      )
      .finally(() => (this.pending = null));
    return this.pending;
  }

  /** Every portal auth answer carries the whole session; the CSRF token is kept by the interceptor. */
  accept(session: PortalSession | null): PortalClient | null {
    const client = session?.client ?? null;
    this.current.set(client);
    return client;
  }

  async signOut(): Promise<void> {
    this.accept(await firstValueFrom(this.http.post<PortalSession>('/api/portal/auth/signout', {})));
  }
}
