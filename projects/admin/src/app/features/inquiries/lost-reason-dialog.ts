import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { TranslatePipe } from '@ngx-translate/core';
import { INQUIRY_LIMITS } from '@layerbook/contracts/types';
import { errorText } from '../../shared/forms/error-text';
import { requiredText } from '../../shared/forms/text-validators';
import { provideFieldDefaults } from '../../../../../shared/app/field-defaults';

export interface LostReasonData {
  readonly contactName: string;
}

/** Asks why an inquiry was lost before it is marked so; closes with the reason, or nothing. */
@Component({
  selector: 'lb-lost-reason-dialog',
  providers: [provideFieldDefaults()],
  imports: [MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, TranslatePipe],
  template: `
    <h2 mat-dialog-title id="lost-title">{{ 'inquiries.lostDialog.title' | translate: { name: data.contactName } }}</h2>
    <form [formGroup]="form" (ngSubmit)="markLost()" novalidate>
      <mat-dialog-content>
        <p>{{ 'inquiries.lostDialog.explain' | translate }}</p>
        <mat-form-field class="lb-full">
          <mat-label>{{ 'inquiries.lostDialog.reason' | translate }}</mat-label>
          <textarea matInput formControlName="reason" rows="3" required cdkFocusInitial></textarea>
          <mat-error>{{ errorText(form.controls.reason, words) }}</mat-error>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" [mat-dialog-close]="undefined">{{ 'inquiries.cancel' | translate }}</button>
        <button mat-flat-button type="submit">{{ 'inquiries.lostDialog.markLost' | translate }}</button>
      </mat-dialog-actions>
    </form>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LostReasonDialog {
  protected readonly data = inject<LostReasonData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<LostReasonDialog, string>>(MatDialogRef);

  protected readonly form = inject(NonNullableFormBuilder).group({
    reason: ['', [requiredText, Validators.maxLength(INQUIRY_LIMITS.lostReason)]],
  });
  protected readonly errorText = errorText;
  protected readonly words = {
    required: 'Say why it was lost; it helps pricing later.',
    maxlength: `Use at most ${INQUIRY_LIMITS.lostReason} characters.`,
  };

  protected markLost(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.ref.close(this.form.controls.reason.value.trim());
  }
}
