import { BreakpointObserver } from '@angular/cdk/layout';
import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatSidenavModule } from '@angular/material/sidenav';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatToolbarModule } from '@angular/material/toolbar';
import { Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { Language as LanguageCode } from '@layerbook/contracts/types';
import { map } from 'rxjs';
import { HOME_URL, urlAfterSignIn } from '../auth/guards';
import { Session } from '../auth/session';
import { toProblem } from '../errors/problem';
import { Wordmark } from '../../shared/ui/wordmark';
import { NAV_ITEMS } from './nav-items';
import { provideFieldDefaults } from '../../../../../shared/app/field-defaults';

/** Phones and small tablets get the navigation as an overlay (crew read job sheets on site). */
const NARROW = '(max-width: 959.98px)';

@Component({
  selector: 'lb-shell',
  providers: [provideFieldDefaults()],
  imports: [
    MatButtonModule,
    MatIconModule,
    MatMenuModule,
    MatSidenavModule,
    MatToolbarModule,
    RouterLink,
    RouterLinkActive,
    RouterOutlet,
    TranslatePipe,
    Wordmark,
  ],
  templateUrl: './shell.html',
  styleUrl: './shell.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Shell {
  private readonly session = inject(Session);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  private readonly translate = inject(TranslateService);
  private readonly document = inject(DOCUMENT);

  protected readonly user = this.session.user;
  protected readonly isNarrow = toSignal(
    inject(BreakpointObserver)
      .observe(NARROW)
      .pipe(map((state) => state.matches)),
    { initialValue: false },
  );
  protected readonly isNavOpen = signal(false);
  protected readonly navItems = computed(() => NAV_ITEMS.filter((item) => this.session.hasRole(item.minRole)));

  /** The person's own language, or null to follow the firm's (names are each language's own, from common). */
  protected readonly languageChoices: readonly { value: LanguageCode | null; label: string }[] = [
    { value: null, label: 'layout.shell.firmLanguage' },
    { value: 'en', label: 'common.languageNames.en' },
    { value: 'es', label: 'common.languageNames.es' },
  ];

  protected toggleNav(): void {
    this.isNavOpen.update((open) => !open);
  }

  protected closeNavOnPhone(): void {
    if (this.isNarrow()) {
      this.isNavOpen.set(false);
    }
  }

  protected async signOut(): Promise<void> {
    try {
      await this.session.signOut();
      await this.router.navigateByUrl('/sign-in');
    } catch (error) {
      this.tell(toProblem(error).title);
    }
  }

  /**
   * Enters another of the person's firms. Signed in there, the app starts again on Today (a full load,
   * so nothing of the first firm stays in memory); asked for a second factor first, it goes to that step.
   */
  protected async switchFirm(firmId: string): Promise<void> {
    try {
      const session = await this.session.switchFirm(firmId);
      if (session.user) this.document.location.assign(HOME_URL);
      else await this.router.navigateByUrl(urlAfterSignIn(session));
    } catch (error) {
      this.tell(toProblem(error).title);
    }
  }

  protected async chooseLanguage(language: LanguageCode | null): Promise<void> {
    try {
      await this.session.chooseLanguage(language);
      this.tell(this.translate.instant('layout.shell.languageSaved') as string);
    } catch (error) {
      this.tell(toProblem(error).title);
    }
  }

  private tell(message: string): void {
    this.snackBar.open(message, this.translate.instant('layout.shell.close') as string, { duration: 6000 });
  }
}
