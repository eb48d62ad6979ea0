import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { InvoiceDetail, InvoiceIssue } from '@layerbook/contracts/types';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { Session } from '../../core/auth/session';
import { DATE_YEAR_WORDS, dateYearInRange, firmToday, toIsoDate } from '../../shared/forms/iso-date';
import { Submission } from '../../shared/forms/submission';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { InvoiceApi } from './invoice-api';
import { TranslatePipe } from '@ngx-translate/core';
import { provideFieldDefaults } from '../../../../../shared/app/field-defaults';

export interface IssueDialogData {
  readonly invoice: InvoiceDetail;
  /** the draft as it was figured again when the server refused the total shown, for the page behind */
  readonly refigured?: (draft: InvoiceDetail) => void;
}

export interface IssueResult {
  readonly invoice: InvoiceDetail;
  /** the office asked for it to be e-mailed (the outbox sends it shortly) */
  readonly isEmailed: boolean;
}

/** Issues a draft: it takes the next number and never changes after. Closes with the issued invoice (its number taken), or nothing. */
@Component({
  selector: 'lb-issue-dialog',
  imports: [
    TranslatePipe,
    FormAlert,
    MatButtonModule,
    MatCheckboxModule,
    MatDatepickerModule,
    MatDialogModule,
    MatFormFieldModule,
    MatInputModule,
    MoneyPipe,
    ReactiveFormsModule,
  ],
  providers: [provideNativeDateAdapter(), provideFieldDefaults()],
  template: `
    <h2 mat-dialog-title>{{ 'billing.issueDialog.issueThisInvoice' | translate }}</h2>
    <form [formGroup]="form" (ngSubmit)="issue()" novalidate>
      <mat-dialog-content>
        <lb-form-alert [message]="submission.message()" />
        <p>
          {{
            'billing.issueDialog.willOweTheInvoice'
              | translate: { clientName: data.invoice.clientName, total: (total() | money: data.invoice.currency) }
          }}
        </p>
        <mat-form-field class="lb-full">
          <mat-label>{{ 'billing.issueDialog.invoiceDate' | translate }}</mat-label>
          <input matInput [matDatepicker]="picker" formControlName="issuedOn" autocomplete="off" required />
          <mat-datepicker-toggle matIconSuffix [for]="picker" />
          <mat-datepicker #picker />
          <mat-hint>{{ data.invoice.document.termsText }}</mat-hint>
          <mat-error>{{ errorText(form.controls.issuedOn, words.issuedOn) }}</mat-error>
        </mat-form-field>
        @if (clientEmail) {
          <mat-checkbox formControlName="send">{{
            'billing.issueDialog.eMailItTo' | translate: { clientEmail: clientEmail }
          }}</mat-checkbox>
        } @else {
          <p class="muted">{{ 'billing.issueDialog.theClientHasNo' | translate }}</p>
        }
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" [mat-dialog-close]="undefined" [disabled]="submission.isBusy()">
          {{ 'billing.issueDialog.cancel' | translate }}
        </button>
        <button mat-flat-button type="submit" [disabled]="submission.isBusy()">
          {{ 'billing.issueDialog.issueTheInvoice' | translate }}
        </button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .muted {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class IssueDialog {
  protected readonly data = inject<IssueDialogData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<IssueDialog, IssueResult>>(MatDialogRef);
  private readonly api = inject(InvoiceApi);
  private readonly fb = inject(NonNullableFormBuilder);

  protected readonly clientEmail = this.data.invoice.document.client.email;
  /** the total the office confirms, sent with the issue: the server refuses (409) to issue another */
  protected readonly total = signal(this.data.invoice.total);
  protected readonly submission = new Submission();
  protected readonly errorText = errorText;
  protected readonly words = {
    issuedOn: { required: 'Enter the invoice date.', matDatepickerParse: 'Enter a date, like 3/14/2026, or pick one.', ...DATE_YEAR_WORDS },
  };

  protected readonly form = this.fb.group({
    // Shown as the firm's today; left as it is, the server dates it today in the firm's own time zone.
    issuedOn: this.fb.control<Date | null>(firmToday(inject(Session).user()?.timeZone), [Validators.required, dateYearInRange]),
    send: this.fb.control(this.clientEmail !== ''),
  });

  protected async issue(): Promise<void> {
    const body = this.toIssue();
    const issued = await this.submission.send(this.form, () => this.issueAsConfirmed(body));
    if (issued) this.ref.close({ invoice: issued, isEmailed: body.send });
  }

  /**
   * The server figures a progress application again as it issues it. When that is not the total shown,
   * it issues nothing (409 on expectedTotal); the draft is then figured again here, its new total shown
   * for the office to confirm, and the server's words said.
   */
  private async issueAsConfirmed(body: InvoiceIssue): Promise<InvoiceDetail> {
    const { invoice } = this.data;
    try {
      return await this.api.issue(invoice.id, body);
    } catch (error) {
      const problem = toProblem(error);
      const hasMoved = problem.status === 409 && (problem.errors ?? []).some((e) => e.field === 'expectedTotal');
      if (hasMoved && invoice.kind === 'progress' && invoice.periodEnd) {
        const refigured = await this.api.update(invoice.id, { periodEnd: invoice.periodEnd }).catch(() => null);
        if (refigured) {
          this.total.set(refigured.total);
          this.data.refigured?.(refigured);
        }
      }
      throw error;
    }
  }

  private toIssue(): InvoiceIssue {
    const { issuedOn, send } = this.form.getRawValue();
    const isDateChosen = this.form.controls.issuedOn.dirty;
    return {
      send: send && this.clientEmail !== '',
      ...(isDateChosen ? { issuedOn: toIsoDate(issuedOn) ?? undefined } : {}),
      expectedTotal: this.total(),
    };
  }
}
