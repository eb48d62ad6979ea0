import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output, untracked } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { INVOICE_LIMITS, type InvoiceDetail } from '@layerbook/contracts/types';
import { errorText } from '../../shared/forms/error-text';
import { tooLong } from '../../shared/forms/field-words';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { FormAlert } from '../../shared/ui/form-alert';
import { InvoiceApi } from './invoice-api';
import { TranslatePipe } from '@ngx-translate/core';

/** A draft's notes to the client, printed on the invoice. */
@Component({
  selector: 'lb-draft-notes',
  imports: [TranslatePipe, FormAlert, MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule],
  template: `
    <form [formGroup]="form" (ngSubmit)="saveNotes()" novalidate [attr.aria-label]="'billing.draftNotes.notesOnTheInvoice' | translate">
      <fieldset class="lb-gate" [disabled]="!isHydrated()">
        <lb-form-alert [message]="submission.message()" />
        <mat-form-field class="lb-full">
          <mat-label>{{ 'billing.draftNotes.notesOnTheInvoice' | translate }}</mat-label>
          <textarea matInput formControlName="notes" rows="3"></textarea>
          <mat-hint>{{ 'billing.draftNotes.theClientReadsThese' | translate }}</mat-hint>
          <mat-error>{{ errorText(form.controls.notes, words) }}</mat-error>
        </mat-form-field>
        <div class="lb-form-actions">
          <button mat-stroked-button type="submit" [disabled]="submission.isBusy() || form.pristine">
            {{ 'billing.draftNotes.saveTheNotes' | translate }}
          </button>
        </div>
      </fieldset>
    </form>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DraftNotes {
  private readonly api = inject(InvoiceApi);

  readonly invoice = input.required<InvoiceDetail>();
  readonly saved = output<InvoiceDetail>();

  protected readonly isHydrated = hydratedSignal();
  protected readonly submission = new Submission();
  protected readonly errorText = errorText;
  protected readonly words = tooLong(INVOICE_LIMITS.notesMaxLength);
  protected readonly form = inject(NonNullableFormBuilder).group({
    notes: ['', Validators.maxLength(INVOICE_LIMITS.notesMaxLength)],
  });

  constructor() {
    // Only a change of the saved notes refills the field: saving the progress keeps notes typed here.
    const savedNotes = computed(() => this.invoice().notes);
    effect(() => {
      const notes = savedNotes();
      untracked(() => this.form.reset({ notes }));
    });
  }

  protected async saveNotes(): Promise<void> {
    const notes = this.form.controls.notes.value.trim();
    const saved = await this.submission.send(this.form, () => this.api.update(this.invoice().id, { notes }));
    if (saved) this.saved.emit(saved);
  }
}
