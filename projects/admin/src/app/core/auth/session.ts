import { HttpClient } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { type StaffRole, type StaffSession, roleAtLeast } from '@layerbook/contracts/types';

export type StaffUser = NonNullable<StaffSession['user']>;

/** Who is signed in to the admin app. `undefined` until the first session answer arrives. */
@Injectable({ providedIn: 'root' })
export class Session {
  private readonly http = inject(HttpClient);
  private readonly current = signal<StaffUser | null | undefined>(undefined);
  private pending: Promise<StaffUser | null> | null = null;

  readonly user = computed(() => this.current() ?? null);
  readonly isOwner = computed(() => this.current()?.role === 'owner');

  /** Loads the session once; an unreachable API counts as signed out so public pages still render. */
  load(): Promise<StaffUser | null> {
    const known = this.current();
    if (known !== undefined) {
      return Promise.resolve(known);
    }
    this.pending ??= firstValueFrom(this.http.get<StaffSession>('/api/auth/session'))
      .then(
        (session) => this.accept(session),
        () => this.accept(null),
      )
      .finally(() => (this.pending = null));
    return this.pending;
  }

  /** Every auth answer carries the whole session; the CSRF token is kept by the interceptor. */
  accept(session: StaffSession | null): StaffUser | null {
    const user = session?.user ?? null;
    this.current.set(user);
    return user;
  }

  hasRole(needed: StaffRole): boolean {
    const user = this.current();
    return !!user && roleAtLeast(user.role, needed);
  }

  async signOut(): Promise<void> {
    const session = await firstValueFrom(this.http.post<StaffSession>('/api/auth/signout', {}));
    this.accept(session);
  }
}
