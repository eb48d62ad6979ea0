import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink, RouterLinkActive } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';

/** The heading row of both inquiry views: switch Board | Table, and log a new one. */
@Component({
  selector: 'lb-inquiry-views',
  imports: [MatButtonModule, MatIconModule, RouterLink, RouterLinkActive, TranslatePipe],
  template: `
    <div class="heading">
      <h1>{{ 'inquiries.views.heading' | translate }}</h1>
      <a mat-flat-button routerLink="/inquiries/new">
        <mat-icon aria-hidden="true">add_call</mat-icon>
        {{ 'inquiries.views.logInquiry' | translate }}
      </a>
    </div>
    <p class="lb-lead">{{ 'inquiries.views.lead' | translate }}</p>
    <nav class="views" [attr.aria-label]="'inquiries.views.label' | translate">
      <a routerLink="/inquiries" routerLinkActive="is-current" [routerLinkActiveOptions]="{ exact: true }" ariaCurrentWhenActive="page">
        <mat-icon aria-hidden="true">view_week</mat-icon>{{ 'inquiries.views.board' | translate }}
      </a>
      <a routerLink="/inquiries/list" routerLinkActive="is-current" ariaCurrentWhenActive="page">
        <mat-icon aria-hidden="true">table_rows</mat-icon>{{ 'inquiries.views.table' | translate }}
      </a>
    </nav>
  `,
  styles: `
    .heading {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      justify-content: space-between;
      gap: 0.75rem;
    }
    .heading h1 {
      margin: 0;
    }
    .views {
      display: inline-flex;
      margin: 0 0 1rem;
      border: 1px solid var(--mat-sys-outline);
      border-radius: 999px;
      overflow: hidden;
    }
    .views a {
      display: inline-flex;
      align-items: center;
      gap: 0.35rem;
      padding: 0.4rem 1rem;
      text-decoration: none;
      color: var(--lb-umber-dark);
    }
    .views a + a {
      border-left: 1px solid var(--mat-sys-outline);
    }
    .views a.is-current {
      background: var(--lb-umber);
      color: var(--lb-ivory);
      font-weight: 600;
    }
    mat-icon {
      font-size: 20px;
      width: 20px;
      height: 20px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryViews {}
