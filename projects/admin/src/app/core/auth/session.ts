import { HttpClient } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { Language } from '../../../../../shared/i18n/language';
import {
  type Language as LanguageCode,
  type FirmSwitch,
  type LanguageChoice,
  type StaffRole,
  type StaffSession,
  roleAtLeast,
} from '@layerbook/contracts/types';

export type StaffUser = NonNullable<StaffSession['user']>;

/** Who is signed in to the admin app. `undefined` until the first session answer arrives. */
@Injectable({ providedIn: 'root' })
export class Session {
  private readonly http = inject(HttpClient);
  private readonly language = inject(Language);
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
    this.follow(user);
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

  /**
   * Enters another firm of this person's: the answer signs in there (user set) or asks for a second
   * factor first (user null, the step in `secondFactor`), leaving the firm they were in.
   */
  async switchFirm(firmId: string): Promise<StaffSession> {
    const session = await firstValueFrom(this.http.post<StaffSession>('/api/auth/firm', { firmId } satisfies FirmSwitch));
    this.accept(session);
    return session;
  }

  /** The person's own language (null follows the firm's); the answer is the whole session, so the words switch with it. */
  async chooseLanguage(language: LanguageCode | null): Promise<void> {
    const session = await firstValueFrom(this.http.patch<StaffSession>('/api/auth/me/language', { language } satisfies LanguageChoice));
    this.accept(session);
  }

  /** The words follow the signed-in person's language (a sign-in or a change of it switches them). */
  private follow(who: { language: 'en' | 'es'; country: string } | null): void {
    if (!who) return;
    this.language.setRegion(who.country);
    if (who.language !== this.language.current()) void this.language.use(who.language);
  }
}
