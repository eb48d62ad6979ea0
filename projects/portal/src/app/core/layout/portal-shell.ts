import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatToolbarModule } from '@angular/material/toolbar';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { NavigationEnd, Router, RouterLink, RouterOutlet } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import type { Language as LanguageCode } from '@layerbook/contracts/types';
import { Session } from '../auth/session';
import { problemMessage, toProblem } from '../errors/problem';
import { FormAlert } from '../../shared/ui/form-alert';
import { Wordmark } from '../../shared/ui/wordmark';
import { LanguageMenu } from './language-menu';
import { provideFieldDefaults } from '../../../../../shared/app/field-defaults';

/** The frame around a signed-in client's pages: whose portal this is, and a way out. */
@Component({
  selector: 'lb-portal-shell',
  providers: [provideFieldDefaults()],
  imports: [FormAlert, MatButtonModule, MatIconModule, LanguageMenu, MatToolbarModule, RouterLink, RouterOutlet, TranslatePipe, Wordmark],
  template: `
    <header>
      <mat-toolbar class="lb-toolbar">
        <a routerLink="/projects" class="home" [attr.aria-label]="'layout.shell.home' | translate">
          <lb-wordmark tone="dark" />
        </a>
        @if (client(); as me) {
          <span class="firm">{{ me.firmName }}</span>
          <span class="spacer"></span>
          <span class="me">{{ me.name }}</span>
          <lb-language-menu [client]="me" (choose)="chooseLanguage($event)" />
          <button mat-button type="button" class="on-dark" (click)="signOut()">
            <mat-icon aria-hidden="true">logout</mat-icon>
            {{ 'layout.shell.signOut' | translate }}
          </button>
        }
      </mat-toolbar>
      @if (client()) {
        <nav class="sections" [attr.aria-label]="'layout.shell.pages' | translate">
          <a
            routerLink="/projects"
            [class.active]="section() === 'projects'"
            [attr.aria-current]="section() === 'projects' ? 'page' : null"
            >{{ 'layout.shell.projects' | translate }}</a
          >
          <a routerLink="/boards" [class.active]="section() === 'boards'" [attr.aria-current]="section() === 'boards' ? 'page' : null">{{
            'layout.shell.boards' | translate
          }}</a>
          <a
            routerLink="/invoices"
            [class.active]="section() === 'invoices'"
            [attr.aria-current]="section() === 'invoices' ? 'page' : null"
            >{{ 'layout.shell.invoices' | translate }}</a
          >
        </nav>
      }
    </header>
    <main class="lb-page">
      <lb-form-alert [message]="message()" />
      <router-outlet />
    </main>
  `,
  styles: `
    .home {
      display: inline-flex;
      text-decoration: none;
    }
    .firm {
      margin-left: 1rem;
      font-size: 1rem;
      overflow: hidden;
      text-overflow: ellipsis;
      white-space: nowrap;
    }
    .sections {
      display: flex;
      flex-wrap: wrap;
      gap: 0.25rem 1.5rem;
      padding: 0.5rem 1rem 0;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
    }
    .sections a {
      padding: 0.5rem 0.25rem;
      border-bottom: 3px solid transparent;
      color: inherit;
      text-decoration: none;
    }
    .sections a:hover {
      text-decoration: underline;
    }
    .sections a.active {
      border-bottom-color: var(--lb-umber);
      font-weight: 600;
    }
    .spacer {
      flex: 1;
    }
    .me {
      font-size: 1rem;
      margin-right: 0.5rem;
    }
    .on-dark {
      --mat-button-text-label-text-color: var(--lb-ivory);
    }
    @media (max-width: 599.98px) {
      .firm,
      .me {
        display: none;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PortalShell {
  private readonly session = inject(Session);
  private readonly router = inject(Router);

  protected readonly client = this.session.client;
  protected readonly message = signal<string | null>(null);
  /**
   * The first part of the page's path: its section is marked (and aria-current) on it and below it,
   * e.g. an invoice of /invoices. Kept here rather than with RouterLinkActive, whose code would
   * otherwise ride in every page's first load.
   */
  protected readonly section = signal(firstPart(this.router.url));

  constructor() {
    this.router.events.pipe(takeUntilDestroyed()).subscribe((event) => {
      if (event instanceof NavigationEnd) this.section.set(firstPart(event.urlAfterRedirects));
    });
  }

  protected async chooseLanguage(language: LanguageCode | null): Promise<void> {
    this.message.set(null);
    try {
      await this.session.chooseLanguage(language);
    } catch (error) {
      this.message.set(problemMessage(error));
    }
  }

  protected async signOut(): Promise<void> {
    this.message.set(null);
    try {
      await this.session.signOut();
      await this.router.navigateByUrl('/sign-in');
    } catch (error) {
      this.message.set(toProblem(error).title);
    }
  }
}

/** "/invoices/12?x=1#y" → "invoices". */
function firstPart(url: string): string {
  return url.split(/[?#]/)[0].split('/')[1] ?? '';
}
