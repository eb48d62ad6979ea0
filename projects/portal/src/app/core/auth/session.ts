import { HttpClient } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { Language } from '../../../../../shared/i18n/language';
import type { LanguageChoice, PortalSession } from '@layerbook/contracts/types';

export type PortalClient = NonNullable<PortalSession['client']>;

/** Why this browser's client was signed out: the firm turned their portal access off (named for the sign-in page). */
export type PortalAccessOff = NonNullable<PortalSession['accessOff']>;

/** Which client is signed in to the portal. `undefined` until a session answer arrives. */
@Injectable({ providedIn: 'root' })
export class Session {
  private readonly http = inject(HttpClient);
  private readonly language = inject(Language);
  private readonly current = signal<PortalClient | null | undefined>(undefined);
  private readonly off = signal<PortalAccessOff | null>(null);
  private pending: Promise<PortalClient | null> | null = null;

  readonly client = computed(() => this.current() ?? null);
  /** Set when this browser's client was signed out because the firm turned their portal access off. */
  readonly accessOff = this.off.asReadonly();

  /**
   * The signed-in client, asked once and then remembered. An unreachable API counts as signed out for
   * this check only (the sign-in page still renders): one failed probe is tried again at once, and a
   * second failure is not remembered, so the next page asks again instead of keeping the client out.
   */
  load(): Promise<PortalClient | null> {
    const known = this.current();
    if (known !== undefined) {
      return Promise.resolve(known);
    }
    this.pending ??= this.ask().finally(() => (this.pending = null));
    return this.pending;
  }

  /**
   * Every portal auth answer carries the whole session; the CSRF token is kept by the interceptor.
   * `null` (the API said the session is over) forgets the client, and the next check asks the API
   * again, whose answer says whether the firm turned access off.
   */
  accept(session: PortalSession | null): PortalClient | null {
    const client = session?.client ?? null;
    this.current.set(session ? client : undefined);
    this.off.set(session?.accessOff ?? null);
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

  private async ask(): Promise<PortalClient | null> {
    for (let attempt = 1; ; attempt++) {
      try {
        return this.accept(await firstValueFrom(this.http.get<PortalSession>('/api/portal/session')));
      } catch {
        if (attempt >= 2) return null;
      }
    }
  }

  /** The words follow the signed-in person's language (a sign-in or a change of it switches them). */
  private follow(who: { language: 'en' | 'es'; country: string } | null): void {
    if (!who) return;
    this.language.setRegion(who.country);
    if (who.language !== this.language.current()) void this.language.use(who.language);
  }
}
