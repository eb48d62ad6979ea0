import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { INVOICE_LIMITS, type InvoiceDetail } from '@layerbook/contracts/types';
import { errorText } from '../../shared/forms/error-text';
import { Submission } from '../../shared/forms/submission';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { InvoiceApi } from './invoice-api';
import { TranslatePipe } from '@ngx-translate/core';
import { provideFieldDefaults } from '../../../../../shared/app/field-defaults';

export interface VoidDialogData {
  readonly invoice: InvoiceDetail;
}

/** Voids an issued invoice with a reason; a numbered credit note cancels it. Closes with the voided invoice, or nothing. */
@Component({
  selector: 'lb-void-dialog',
  providers: [provideFieldDefaults()],
  imports: [TranslatePipe, FormAlert, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule, MoneyPipe, ReactiveFormsModule],
  template: `
    <h2 mat-dialog-title>{{ 'billing.voidDialog.void' | translate: { number: data.invoice.number } }}</h2>
    <form [formGroup]="form" (ngSubmit)="voidInvoice()" novalidate>
      <mat-dialog-content>
        <lb-form-alert [message]="submission.message()" />
        <p>
          {{ 'billing.voidDialog.aCreditNoteFor' | translate: { total: (data.invoice.total | money: data.invoice.currency) } }}
        </p>
        <mat-form-field class="lb-full">
          <mat-label>{{ 'billing.voidDialog.whyItIsVoided' | translate }}</mat-label>
          <textarea matInput formControlName="reason" rows="3" required cdkFocusInitial></textarea>
          <mat-hint>{{ 'billing.voidDialog.printedOnTheCredit' | translate }}</mat-hint>
          <mat-error>{{ errorText(form.controls.reason, words) }}</mat-error>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" [mat-dialog-close]="undefined" [disabled]="submission.isBusy()">
          {{ 'billing.voidDialog.cancel' | translate }}
        </button>
        <button mat-flat-button type="submit" [disabled]="submission.isBusy()">{{ 'billing.voidDialog.voidAndMakeA' | translate }}</button>
      </mat-dialog-actions>
    </form>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class VoidDialog {
  protected readonly data = inject<VoidDialogData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<VoidDialog, InvoiceDetail>>(MatDialogRef);
  private readonly api = inject(InvoiceApi);

  protected readonly submission = new Submission();
  protected readonly errorText = errorText;
  protected readonly words = {
    required: 'Say why it is voided; the client reads it on the credit note.',
    maxlength: `Use at most ${INVOICE_LIMITS.reasonMaxLength} characters.`,
  };
  protected readonly form = inject(NonNullableFormBuilder).group({
    reason: ['', [requiredText, Validators.maxLength(INVOICE_LIMITS.reasonMaxLength)]],
  });

  protected async voidInvoice(): Promise<void> {
    const reason = this.form.controls.reason.value.trim();
    const voided = await this.submission.send(this.form, () => this.api.void(this.data.invoice.id, { reason }));
    if (voided) this.ref.close(voided);
  }
}
