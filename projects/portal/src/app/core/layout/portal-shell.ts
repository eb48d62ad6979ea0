import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatToolbarModule } from '@angular/material/toolbar';
import { Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { Session } from '../auth/session';
import { toProblem } from '../errors/problem';
import { FormAlert } from '../../shared/ui/form-alert';
import { Wordmark } from '../../shared/ui/wordmark';

/** The frame around a signed-in client's pages: whose portal this is, and a way out. */
@Component({
  selector: 'lb-portal-shell',
  imports: [FormAlert, MatButtonModule, MatIconModule, MatToolbarModule, RouterLink, RouterLinkActive, RouterOutlet, Wordmark],
  template: `
    <header>
      <mat-toolbar class="lb-toolbar">
        <a routerLink="/projects" class="home" aria-label="Layerbook, go to your projects">
          <lb-wordmark tone="dark" />
        </a>
        @if (client(); as me) {
          <span class="firm">{{ me.firmName }}</span>
          <span class="spacer"></span>
          <span class="me">{{ me.name }}</span>
          <button mat-button type="button" class="sign-out" (click)="signOut()">
            <mat-icon aria-hidden="true">logout</mat-icon>
            Sign out
          </button>
        }
      </mat-toolbar>
      @if (client()) {
        <nav class="sections" aria-label="Your pages">
          <a routerLink="/projects" routerLinkActive="active" ariaCurrentWhenActive="page">Your projects</a>
          <a routerLink="/invoices" routerLinkActive="active" ariaCurrentWhenActive="page">Your invoices</a>
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
    .sign-out {
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
