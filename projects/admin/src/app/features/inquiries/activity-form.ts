import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { ActivityCreate, InquiryDetail } from '@layerbook/contracts';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { InquiryApi } from './inquiry-api';

type LoggedKind = ActivityCreate['kind'];

const KIND_CHOICES = [
  { value: 'note', label: 'Note' },
  { value: 'call', label: 'Call' },
  { value: 'email', label: 'E-mail' },
] as const satisfies readonly { value: LoggedKind; label: string }[];

type MissingKind = Exclude<LoggedKind, (typeof KIND_CHOICES)[number]['value']>;
export const ALL_KINDS_LISTED: [MissingKind] extends [never] ? true : never = true;

/** Adds a note, a call or an e-mail to an inquiry's log. */
@Component({
  selector: 'lb-activity-form',
  imports: [FormAlert, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule, ReactiveFormsModule],
  template: `
    <form [formGroup]="form" #formDir="ngForm" (ngSubmit)="addToLog(formDir)" novalidate aria-label="Add to the log">
      <fieldset class="lb-gate fields" [disabled]="!isHydrated()">
        <lb-form-alert [message]="formMessage()" />
        <mat-form-field class="kind">
          <mat-label>Kind</mat-label>
          <mat-select formControlName="kind" required>
            @for (choice of kinds; track choice.value) {
              <mat-option [value]="choice.value">{{ choice.label }}</mat-option>
            }
          </mat-select>
          <mat-error>{{ errorText(form.controls.kind, words.kind) }}</mat-error>
        </mat-form-field>
        <mat-form-field class="body">
          <mat-label>What happened</mat-label>
          <textarea matInput formControlName="body" rows="3" required></textarea>
          <mat-error>{{ errorText(form.controls.body, words.body) }}</mat-error>
        </mat-form-field>
        <div class="lb-form-actions">
          <button mat-stroked-button type="submit" [disabled]="isBusy()">Add to log</button>
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

  protected readonly kinds = KIND_CHOICES;
  protected readonly form = this.fb.group({
    kind: this.fb.control<LoggedKind>('note', Validators.required),
    body: ['', [requiredText, Validators.maxLength(5000)]],
  });
  protected readonly isHydrated = hydratedSignal();
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly words = {
    kind: { required: 'Choose note, call or e-mail.' },
    body: { required: 'Write what happened.', maxlength: 'Use at most 5000 characters.' },
  };

  protected async addToLog(formDir: FormGroupDirective): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const { kind, body } = this.form.getRawValue();
      const saved = await this.api.addActivity(this.inquiryId(), { kind, body: body.trim() });
      // resetForm also clears "submitted", so the emptied text area does not show as an error.
      formDir.resetForm({ kind, body: '' });
      this.saved.emit(saved);
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }
}
