import { HttpClient } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { Language } from '../../../../../shared/i18n/language';
import type { LanguageChoice, PortalSession } from '@layerbook/contracts/types';

export type PortalClient = NonNullable<PortalSession['client']>;

/** Which client is signed in to the portal. `undefined` until the first session answer arrives. */
@Injectable({ providedIn: 'root' })
export class Session {
  private readonly http = inject(HttpClient);
  private readonly language = inject(Language);
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
    this.follow(client);
    return client;
  }

  /** The client's own language, or null to follow the firm's; the answer is the whole session. */
  async chooseLanguage(language: LanguageChoice['language']): Promise<void> {
    const body: LanguageChoice = { language };
    this.accept(await firstValueFrom(this.http.patch<PortalSession>('/api/portal/me/language', body)));
  }

  async signOut(): Promise<void> {
    this.accept(await firstValueFrom(this.http.post<PortalSession>('/api/portal/auth/signout', {})));
  }

  /** The words follow the signed-in person's language (a sign-in or a change of it switches them). */
  private follow(who: { language: 'en' | 'es'; country: string } | null): void {
    if (!who) return;
    this.language.setRegion(who.country);
    if (who.language !== this.language.current()) void this.language.use(who.language);
  }
}
