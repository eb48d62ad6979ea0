import { DatePipe } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import { roundsToZero } from '@layerbook/contracts/engine';
import type { InvoiceDetail } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';
import { problemMessage } from '../../core/errors/problem';
import { loadMessage } from '../../shared/forms/load-message';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { DraftNotes } from './draft-notes';
import { INVOICES_URL, InvoiceApi, creditNotePdfHref, invoicePdfHref } from './invoice-api';
import { canBeVoided, invoiceStatus, kindWord, mustRefundBeforeVoid, paymentRecordedWords, takesPayments } from './invoice-words';
import { InvoicePayments, type RefundOutcome } from '../payments/invoice-payments';
import { IssueDialog, type IssueDialogData, type IssueResult } from './issue-dialog';
import { PaymentForm } from './payment-form';
import { ProgressTable } from './progress-table';
import { VoidDialog, type VoidDialogData } from './void-dialog';
import { TranslatePipe } from '@ngx-translate/core';

/** One invoice: review and issue a draft; for an issued one, its PDF, payments, reminders, void and history. */
@Component({
  selector: 'lb-invoice-detail',
  imports: [
    TranslatePipe,
    CalendarDatePipe,
    DatePipe,
    DraftNotes,
    FormAlert,
    InvoicePayments,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    MoneyPipe,
    PaymentForm,
    ProgressTable,
    RouterLink,
  ],
  templateUrl: './invoice-detail.html',
  styleUrl: './invoice-detail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InvoiceDetailPage {
  private readonly api = inject(InvoiceApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly router = inject(Router);

  /** from the route (withComponentInputBinding) */
  readonly id = input.required<string>();

  private readonly loaded = httpResource<InvoiceDetail>(() => `${INVOICES_URL}/${encodeURIComponent(this.id())}`);
  protected readonly invoice = computed(() => (this.loaded.hasValue() ? this.loaded.value() : null));
  protected readonly isLoading = this.loaded.isLoading;
  protected readonly loadError = loadMessage(this.loaded);
  /** what the last action did, said once for screen readers too */
  protected readonly done = signal<string | null>(null);
  protected readonly actionMessage = signal<string | null>(null);
  protected readonly isBusy = signal(false);
  protected readonly isRecordingPayment = signal(false);

  protected readonly status = computed(() => {
    const invoice = this.invoice();
    return invoice ? invoiceStatus(invoice) : null;
  });
  protected readonly canRecordPayment = computed(() => {
    const invoice = this.invoice();
    return !!invoice && takesPayments(invoice.status) && !roundsToZero(invoice.amountDue, invoice.currency);
  });
  /** Voiding is refused while money is kept on it ("Refund the payments first"), so it is offered only before or after. */
  protected readonly canVoid = computed(() => {
    const invoice = this.invoice();
    return !!invoice && canBeVoided(invoice);
  });
  protected readonly mustRefundFirst = computed(() => {
    const invoice = this.invoice();
    return !!invoice && mustRefundBeforeVoid(invoice);
  });

  protected readonly kindWord = kindWord;
  protected readonly pdfHref = invoicePdfHref;
  protected readonly creditNotePdfHref = creditNotePdfHref;
  protected readonly isZero = (amount: string, currency: string): boolean => roundsToZero(amount, currency);

  protected show(invoice: InvoiceDetail, done: string | null = null): void {
    this.loaded.set(invoice);
    this.actionMessage.set(null);
    this.done.set(done);
  }

  protected async openIssue(invoice: InvoiceDetail): Promise<void> {
    const refigured = (draft: InvoiceDetail) => this.loaded.set(draft);
    const ref = this.dialog.open<IssueDialog, IssueDialogData, IssueResult>(IssueDialog, { data: { invoice, refigured }, width: '32rem' });
    const result = await firstValueFrom(ref.afterClosed());
    if (result) {
      const number = result.invoice.number ?? '';
      this.show(result.invoice, result.isEmailed ? `Issued as ${number} and on its way to the client.` : `Issued as ${number}.`);
    }
  }

  protected async openVoid(invoice: InvoiceDetail): Promise<void> {
    const ref = this.dialog.open<VoidDialog, VoidDialogData, InvoiceDetail>(VoidDialog, { data: { invoice }, width: '32rem' });
    const voided = await firstValueFrom(ref.afterClosed());
    if (voided) {
      const note = voided.creditNote ? ` Credit note ${voided.creditNote.number} cancels it.` : '';
      this.show(voided, `${voided.number ?? 'The invoice'} is void.${note}`);
    }
  }

  protected paymentRecorded(invoice: InvoiceDetail): void {
    this.isRecordingPayment.set(false);
    this.show(invoice, paymentRecordedWords(this.invoice()?.payments ?? [], invoice));
  }

  /** A refund changes the payment, the invoice's amounts and perhaps its status: read it again. */
  protected refundDone(outcome: RefundOutcome): void {
    this.actionMessage.set(outcome.problem ?? null);
    this.done.set(outcome.words);
    this.loaded.reload();
  }

  /** while a refund is on its way back to a card: what was said stays said */
  protected readAgain(): void {
    this.loaded.reload();
  }

  protected async deleteDraft(invoice: InvoiceDetail): Promise<void> {
    const confirmed = await this.confirm({
      title: 'Delete this draft?',
      message: invoice.scheduleLineId
        ? 'Nothing was sent. Its payment goes back to waiting in the job’s schedule.'
        : 'Nothing was sent; the work it billed stays unbilled.',
      confirmLabel: 'Delete the draft',
    });
    if (!confirmed) return;
    this.isBusy.set(true);
    this.actionMessage.set(null);
    try {
      await this.api.deleteDraft(invoice.id);
      this.snackBar.open('Draft deleted.', 'Close', { duration: 5000 });
      await this.router.navigate(['/billing']);
    } catch (error) {
      this.actionMessage.set(problemMessage(error));
    } finally {
      this.isBusy.set(false);
    }
  }

  private confirm(data: ConfirmDialogData): Promise<boolean | undefined> {
    return firstValueFrom(this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data }).afterClosed());
  }
}
