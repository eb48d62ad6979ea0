import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, RESPONSE_INIT, computed, effect, inject, input, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import type { PortalProposal } from '@layerbook/contracts';
import { toProblem } from '../../core/errors/problem';
import { formatDay, formatMoment } from '../../shared/format/money';
import { AcceptanceForm } from './acceptance-form';
import { AnswerForms } from './answer-forms';
import { ProposalApi } from './proposal-api';
import { ProposalDocument } from './proposal-document';
import { PROPOSAL_STATUS_WORDS } from './status-words';

/** One proposal version for the signed-in client: read it, then accept, ask for changes or decline. */
@Component({
  selector: 'lb-proposal-page',
  imports: [AcceptanceForm, AnswerForms, MatIconModule, MatProgressBarModule, ProposalDocument, RouterLink],
  templateUrl: './proposal-page.html',
  styles: `
    .heading { display: flex; flex-wrap: wrap; gap: 0.5rem 1rem; align-items: baseline; justify-content: space-between; }
    .heading h1 { margin: 0; }
    .meta { color: var(--mat-sys-on-surface-variant); margin: 0.25rem 0 1rem; }
    .pdf { display: inline-flex; gap: 0.25rem; align-items: center; }
    .answer { margin: 2rem 0 0; padding: 1.25rem; border-radius: 12px; border: 1px solid var(--mat-sys-outline-variant); background: var(--mat-sys-surface-container-low); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProposalPage {
  private readonly api = inject(ProposalApi);
  private readonly title = inject(Title);
  private readonly response = inject(RESPONSE_INIT, { optional: true });
  private readonly document = inject(DOCUMENT);

  /** route parameter */
  readonly id = input.required<string>();

  protected readonly proposal = signal<PortalProposal | null>(null);
  protected readonly isLoading = signal(true);
  protected readonly loadMessage = signal<string | null>(null);
  protected readonly statusWords = PROPOSAL_STATUS_WORDS;

  /** Open for an answer: sent, the newest version, and not past its expiry day. */
  protected readonly isOpen = computed(() => {
    const p = this.proposal();
    return !!p && p.status === 'sent' && p.isLatest && !p.isExpired;
  });
  protected readonly pdfUrl = computed(() => this.api.pdfUrl(this.id()));

  constructor() {
    effect(() => void this.load(this.id()));
  }

  protected day(isoDay: string): string {
    return formatDay(isoDay, this.proposal()?.snapshot.locale ?? 'en-US');
  }

  protected moment(iso: string | null): string {
    return iso ? formatMoment(iso, this.proposal()?.snapshot.locale ?? 'en-US') : '';
  }

  protected optionLabel(p: PortalProposal): string {
    return p.snapshot.options.find((o) => o.id === p.acceptedVariantId)?.label ?? '';
  }

  /** After an answer the forms go away; bring the reader back to the message at the top. */
  protected show(answer: PortalProposal): void {
    this.proposal.set(answer);
    this.document.querySelector('h1')?.scrollIntoView();
  }

  private async load(id: string): Promise<void> {
    this.isLoading.set(true);
    this.loadMessage.set(null);
    try {
      const p = await this.api.get(id);
      this.proposal.set(p);
      this.title.setTitle(`${p.snapshot.title} · Layerbook client portal`);
    } catch (error) {
      const problem = toProblem(error);
      if (problem.status === 404 || problem.status === 400) {
        if (this.response) this.response.status = 404;
        this.loadMessage.set('We could not find this proposal. Open it from your projects or from the e-mail the firm sent.');
      } else {
        this.loadMessage.set(problem.detail ?? problem.title);
      }
    } finally {
      this.isLoading.set(false);
    }
  }
}
