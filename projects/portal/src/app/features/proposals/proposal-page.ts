import { DOCUMENT } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, RESPONSE_INIT, computed, effect, inject, input, signal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { PortalProposal, PortalProposalAccepted } from '@layerbook/contracts/types';
import { SayPipe } from '../../../../../shared/errors/say-pipe';
import { LbDatePipe } from '../../../../../shared/i18n/format';
import { Language } from '../../../../../shared/i18n/language';
import { problemMessage, toProblem } from '../../core/errors/problem';
import { AcceptanceForm } from './acceptance-form';
import { AnswerForms } from './answer-forms';
import { DepositReady } from './deposit-ready';
import { ProposalApi, proposalUrl } from './proposal-api';
import { ProposalDocument } from './proposal-document';

/** One proposal version for the signed-in client: read it, then accept, ask for changes or decline. */
@Component({
  selector: 'lb-proposal-page',
  imports: [
    AcceptanceForm,
    AnswerForms,
    DepositReady,
    LbDatePipe,
    MatIconModule,
    MatProgressBarModule,
    ProposalDocument,
    RouterLink,
    SayPipe,
    TranslatePipe,
  ],
  templateUrl: './proposal-page.html',
  styles: `
    .heading {
      display: flex;
      flex-wrap: wrap;
      gap: 0.5rem 1rem;
      align-items: baseline;
      justify-content: space-between;
    }
    .heading h1 {
      margin: 0;
    }
    .meta {
      color: var(--mat-sys-on-surface-variant);
      margin: 0.25rem 0 1rem;
    }
    .pdf {
      display: inline-flex;
      gap: 0.25rem;
      align-items: center;
    }
    .answer {
      margin: 2rem 0 0;
      padding: 1.25rem;
      border-radius: 12px;
      border: 1px solid var(--mat-sys-outline-variant);
      background: var(--mat-sys-surface-container-low);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProposalPage {
  private readonly api = inject(ProposalApi);
  private readonly title = inject(Title);
  private readonly response = inject(RESPONSE_INIT, { optional: true });
  private readonly document = inject(DOCUMENT);
  private readonly translate = inject(TranslateService);
  private readonly language = inject(Language);

  /** route parameter */
  readonly id = input.required<string>();

  private readonly loaded = httpResource<PortalProposal>(() => proposalUrl(this.id()));

  protected readonly proposal = computed(() => (this.loaded.hasValue() ? this.loaded.value() : null));
  protected readonly isLoading = this.loaded.isLoading;
  /** 404 and a malformed id read the same: the link is wrong, or the proposal is not theirs. */
  private readonly isMissing = computed(() => {
    const error = this.loaded.error();
    return error !== undefined && [400, 404].includes(toProblem(error).status);
  });
  protected readonly loadMessage = computed(() => {
    const error = this.loaded.error();
    if (!error) return null;
    return this.isMissing() ? 'proposals.page.missing' : problemMessage(error);
  });
  /** the deposit invoice issued in the acceptance just made (the answer says; a later visit finds it under the invoices) */
  protected readonly depositInvoiceId = signal<string | null>(null);

  /** Open for an answer: sent, the newest version, and not past its expiry day. */
  protected readonly isOpen = computed(() => {
    const p = this.proposal();
    return !!p && p.status === 'sent' && p.isLatest && !p.isExpired;
  });
  /** Sent and the newest, but past its expiry day: no acceptance, though changes can still be asked for. */
  protected readonly isExpiredOpen = computed(() => {
    const p = this.proposal();
    return !!p && p.status === 'sent' && p.isLatest && p.isExpired;
  });
  /** an answer given on this page (the loaded proposal replaced by the answer) */
  private readonly isAnsweredHere = signal(false);
  private readonly isLanguageChanged = this.language.changedSinceNow();
  /**
   * The document's hydration is deferred (proposal-page.html): it wakes up when what it shows
   * changes — an answer given here (the chosen option), another language — or when tapped.
   */
  protected readonly mustRedrawDocument = computed(() => this.isAnsweredHere() || this.isLanguageChanged());
  protected readonly pdfUrl = computed(() => this.api.pdfUrl(this.id()));
  protected readonly signedPdfUrl = computed(() => this.api.signedPdfUrl(this.id()));

  constructor() {
    effect(() => {
      const p = this.proposal();
      this.language.current();
      if (p) this.title.setTitle(this.translate.instant('layout.titles.named', { name: p.snapshot.title }) as string);
    });
    // Tells crawlers and the host's logs the truth while rendering on the server.
    effect(() => {
      if (this.isMissing() && this.response) this.response.status = 404;
    });
  }

  /** The option accepted, and the add-ons taken with it ("Polished lime + Stencilled border"). */
  protected optionLabel(p: PortalProposal): string {
    const addOns = p.acceptedAddOnIds.map((id) => p.snapshot.addOns.find((a) => a.id === id)?.label ?? id);
    return [p.snapshot.options.find((o) => o.id === p.acceptedVariantId)?.label ?? '', ...addOns].join(' + ');
  }

  /** Accepted: the deposit invoice to pay now, when the firm issued it in the same step. */
  protected accepted(answer: PortalProposalAccepted): void {
    this.depositInvoiceId.set(answer.depositInvoiceId);
    this.show(answer);
  }

  /** After an answer the forms go away; bring the reader back to the message at the top. */
  protected show(answer: PortalProposal): void {
    this.isAnsweredHere.set(true);
    this.loaded.set(answer);
    this.document.querySelector('h1')?.scrollIntoView();
  }
}
