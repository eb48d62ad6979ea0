import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { InvoiceDetail, InvoiceIssue } from '@layerbook/contracts/types';
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
              | translate: { clientName: data.invoice.clientName, total: (data.invoice.total | money: data.invoice.currency) }
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
    const issued = await this.submission.send(this.form, () => this.api.issue(this.data.invoice.id, body));
    if (issued) this.ref.close({ invoice: issued, isEmailed: body.send });
  }

  private toIssue(): InvoiceIssue {
    const { issuedOn, send } = this.form.getRawValue();
    const isDateChosen = this.form.controls.issuedOn.dirty;
    return { send: send && this.clientEmail !== '', ...(isDateChosen ? { issuedOn: toIsoDate(issuedOn) ?? undefined } : {}) };
  }
}
