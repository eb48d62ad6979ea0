import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { PROPOSAL_CLIENT_STATUS_LABELS, type ItemList, type PortalProposalSummary } from '@layerbook/contracts/types';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { formatDay } from '../../shared/format/money';
import { PROPOSALS_URL } from './proposal-api';

@Component({
  selector: 'lb-proposal-list',
  imports: [MatIconModule, MatProgressBarModule, RouterLink],
  template: `
    <h1>Your projects</h1>
    @if (client(); as me) {
      <p class="lb-lead">Proposals, sample boards, invoices and receipts from {{ me.firmName }}.</p>
      <p><a routerLink="/boards">See your sample boards</a></p>
    }
    @if (isLoading()) {
      <mat-progress-bar mode="indeterminate" aria-label="Loading your projects" />
    } @else if (loadMessage(); as message) {
      <p class="lb-form-alert" role="alert">{{ message }}</p>
    } @else if (projects().length === 0) {
      <div class="empty">
        <mat-icon aria-hidden="true">folder_open</mat-icon>
        <p>
          Nothing here yet. When your firm sends you a proposal or an invoice, it will appear on this page and you will get an e-mail too.
        </p>
      </div>
    } @else {
      <ul class="list">
        @for (project of projects(); track project.estimateId) {
          <li class="project">
            <h2>{{ project.title }}</h2>
            <p class="site">{{ project.siteAddress }}</p>
            <p>
              Proposal, version {{ project.latest.version }}:
              <strong>{{ statusWords[project.latest.status] }}</strong>
              @if (project.latest.status === 'sent') {
                · the offer stands until {{ day(project.latest.expiresOn) }}
              }
            </p>
            <a [routerLink]="['/proposals', project.latest.id]"
              >Read the proposal<span class="lb-visually-hidden"> for {{ project.title }}</span></a
            >
          </li>
        }
      </ul>
    }
  `,
  styles: `
    .empty {
      display: flex;
      gap: 1rem;
      align-items: flex-start;
      max-width: 40rem;
      padding: 1.25rem 1.5rem;
      border: 2px dashed var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
    }
    .empty p {
      margin: 0;
    }
    .empty mat-icon {
      color: var(--lb-verdigris);
    }
    .list {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 1rem;
      max-width: 48rem;
    }
    .project {
      padding: 1rem 1.25rem;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
    }
    .project h2 {
      font-family: var(--lb-serif);
      margin: 0 0 0.25rem;
      font-size: 1.25rem;
    }
    .project p {
      margin: 0 0 0.5rem;
    }
    .site {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
/** The client's proposals, one per estimate ("your projects" to the client). */
export class ProposalList {
  private readonly list = httpResource<ItemList<PortalProposalSummary>>(() => PROPOSALS_URL);

  protected readonly client = inject(Session).client;
  protected readonly projects = computed(() => (this.list.hasValue() ? this.list.value().items : []));
  protected readonly isLoading = this.list.isLoading;
  protected readonly loadMessage = computed(() => {
    const error = this.list.error();
    return error ? toProblem(error).title : null;
  });
  protected readonly statusWords = PROPOSAL_CLIENT_STATUS_LABELS;

  protected day(isoDay: string): string {
    return formatDay(isoDay, 'en-US');
  }
}
