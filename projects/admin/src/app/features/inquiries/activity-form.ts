import { ChangeDetectionStrategy, Component, inject, input, output } from '@angular/core';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { TranslatePipe } from '@ngx-translate/core';
import {
  INQUIRY_LIMITS,
  LOGGED_ACTIVITY_KINDS,
  LOGGED_ACTIVITY_LABELS,
  type InquiryDetail,
  type LoggedActivityKind,
} from '@layerbook/contracts/types';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { InquiryApi } from './inquiry-api';

/** Adds a note, a call or an e-mail to an inquiry's log. */
@Component({
  selector: 'lb-activity-form',
  imports: [FormAlert, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule, ReactiveFormsModule, TranslatePipe],
  template: `
    <form
      [formGroup]="form"
      #formDir="ngForm"
      (ngSubmit)="addToLog(formDir)"
      novalidate
      [attr.aria-label]="'inquiries.activityForm.label' | translate"
    >
      <fieldset class="lb-gate fields" [disabled]="!isHydrated()">
        <lb-form-alert [message]="submission.message()" />
        <mat-form-field class="kind">
          <mat-label>{{ 'inquiries.activityForm.kind' | translate }}</mat-label>
          <mat-select formControlName="kind" required>
            @for (kind of kinds; track kind) {
              <mat-option [value]="kind">{{ kindLabels[kind] }}</mat-option>
            }
          </mat-select>
          <mat-error>{{ errorText(form.controls.kind, words.kind) }}</mat-error>
        </mat-form-field>
        <mat-form-field class="body">
          <mat-label>{{ 'inquiries.activityForm.body' | translate }}</mat-label>
          <textarea matInput formControlName="body" rows="3" required></textarea>
          <mat-error>{{ errorText(form.controls.body, words.body) }}</mat-error>
        </mat-form-field>
        <div class="lb-form-actions">
          <button mat-stroked-button type="submit" [disabled]="submission.isBusy()">{{ 'inquiries.activityForm.add' | translate }}</button>
        </div>
      </fieldset>
    </form>
  `,
  styles: `
    .fields {
      display: grid;
      grid-template-columns: 10rem 1fr;
      gap: 0.75rem;
      align-items: start;
    }
    lb-form-alert,
    .lb-form-actions {
      grid-column: 1 / -1;
    }
    @media (max-width: 599.98px) {
      .fields {
        grid-template-columns: 1fr;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ActivityForm {
  private readonly api = inject(InquiryApi);
  private readonly fb = inject(NonNullableFormBuilder);

  readonly inquiryId = input.required<string>();
  readonly saved = output<InquiryDetail>();

  protected readonly kinds = LOGGED_ACTIVITY_KINDS;
  protected readonly kindLabels = LOGGED_ACTIVITY_LABELS;
  protected readonly form = this.fb.group({
    kind: this.fb.control<LoggedActivityKind>('note', Validators.required),
    body: ['', [requiredText, Validators.maxLength(INQUIRY_LIMITS.activityBody)]],
  });
  protected readonly isHydrated = hydratedSignal();
  protected readonly submission = new Submission();
  protected readonly errorText = errorText;
  protected readonly words = {
    kind: { required: 'Choose note, call or e-mail.' },
    body: { required: 'Write what happened.', maxlength: `Use at most ${INQUIRY_LIMITS.activityBody} characters.` },
  };

  protected async addToLog(formDir: FormGroupDirective): Promise<void> {
    const { kind, body } = this.form.getRawValue();
    const saved = await this.submission.send(this.form, () => this.api.addActivity(this.inquiryId(), { kind, body: body.trim() }));
    if (saved) {
      // resetForm also clears "submitted", so the emptied text area does not show as an error.
      formDir.resetForm({ kind, body: '' });
      this.saved.emit(saved);
    }
  }
}
