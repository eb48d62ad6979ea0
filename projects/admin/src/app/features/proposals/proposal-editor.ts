import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, output, signal } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { TranslatePipe } from '@ngx-translate/core';
import type { ProposalVersionView } from '@layerbook/contracts/types';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { FormAlert } from '../../shared/ui/form-alert';
import { ProposalApi } from './proposal-api';
import { PROGRESS_PAYMENT_HINT } from './proposal-words';
import {
  MAX_EXCLUSIONS,
  MAX_TEXT,
  PROPOSAL_WORDS,
  fillProposal,
  placeExclusionErrors,
  proposalForm,
  readProposal,
  startNewProposal,
} from './proposal-form';

/**
 * The choices a proposal version carries beyond the estimate's numbers: how long the offer stands,
 * how the client pays, what is left out. Makes a new draft, or changes the given one.
 */
@Component({
  selector: 'lb-proposal-editor',
  imports: [
    FormAlert,
    MatButtonModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    ReactiveFormsModule,
    TranslatePipe,
  ],
  providers: [provideNativeDateAdapter()],
  template: `
    <form class="editor" [formGroup]="form" (ngSubmit)="save()" novalidate [attr.aria-labelledby]="headingId()">
      <h3 [id]="headingId()">
        {{
          draft() ? ('proposals.editor.changeVersion' | translate: { n: draft()!.version }) : ('proposals.editor.newVersion' | translate)
        }}
      </h3>
      <p class="hint">{{ 'proposals.editor.hint' | translate }}</p>
      <lb-form-alert [message]="message()" />
      <fieldset class="lb-gate" [disabled]="!isHydrated() || isSaving()">
        <div class="row">
          <mat-form-field>
            <mat-label>{{ 'proposals.editor.validUntil' | translate }}</mat-label>
            <input matInput [matDatepicker]="picker" formControlName="expiresOn" autocomplete="off" required />
            <mat-datepicker-toggle matIconSuffix [for]="picker" />
            <mat-datepicker #picker />
            <mat-hint>{{ 'proposals.editor.validUntilHint' | translate }}</mat-hint>
            <mat-error>{{ errorText(form.controls.expiresOn, words.expiresOn) }}</mat-error>
          </mat-form-field>
          <ng-container formGroupName="terms">
            <mat-form-field class="pct">
              <mat-label>{{ 'proposals.editor.deposit' | translate }}</mat-label>
              <input matInput type="number" inputmode="numeric" min="0" max="100" step="1" formControlName="depositPercent" required />
              <mat-hint>{{ 'proposals.editor.depositHint' | translate }}</mat-hint>
              <mat-error>{{ errorText(form.controls.terms.controls.depositPercent, words.percent) }}</mat-error>
            </mat-form-field>
            <mat-form-field class="pct">
              <mat-label>{{ 'proposals.editor.progress' | translate }}</mat-label>
              <input matInput type="number" inputmode="numeric" min="0" max="100" step="1" formControlName="progressPercent" required />
              <mat-hint>{{ progressHint }}</mat-hint>
              <mat-error>{{ errorText(form.controls.terms.controls.progressPercent, words.percent) }}</mat-error>
            </mat-form-field>
          </ng-container>
        </div>
        <mat-form-field class="lb-full" formGroupName="terms">
          <mat-label>{{ 'proposals.editor.terms' | translate }}</mat-label>
          <textarea matInput formControlName="text" rows="3" [maxlength]="maxText"></textarea>
          <mat-hint>{{ 'proposals.editor.termsHint' | translate }}</mat-hint>
          <mat-error>{{ errorText(form.controls.terms.controls.text, words.text) }}</mat-error>
        </mat-form-field>
        <mat-form-field class="lb-full">
          <mat-label>{{ 'proposals.editor.exclusions' | translate }}</mat-label>
          <textarea matInput formControlName="exclusions" rows="4"></textarea>
          <mat-hint>{{ 'proposals.editor.exclusionsHint' | translate: { max: maxExclusions } }}</mat-hint>
          <mat-error>{{ errorText(form.controls.exclusions, words.exclusions) }}</mat-error>
        </mat-form-field>
        <mat-form-field class="lb-full">
          <mat-label>{{ 'proposals.editor.notes' | translate }}</mat-label>
          <textarea matInput formControlName="notes" rows="3" [maxlength]="maxText"></textarea>
          <mat-hint>{{ 'proposals.editor.notesHint' | translate }}</mat-hint>
          <mat-error>{{ errorText(form.controls.notes, words.text) }}</mat-error>
        </mat-form-field>
        <div class="lb-form-actions">
          <button mat-flat-button type="submit">
            <mat-icon aria-hidden="true">{{ draft() ? 'save' : 'note_add' }}</mat-icon>
            {{ (draft() ? 'proposals.editor.save' : 'proposals.editor.create') | translate }}
          </button>
          <button mat-button type="button" (click)="cancelled.emit()">{{ 'proposals.cancel' | translate }}</button>
        </div>
      </fieldset>
    </form>
  `,
  styles: `
    .editor {
      padding: 1rem;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
    }
    h3 {
      margin: 0;
      font-size: 1.15rem;
    }
    .hint {
      margin: 0.25rem 0 1rem;
      color: var(--mat-sys-on-surface-variant);
    }
    .row {
      display: flex;
      flex-wrap: wrap;
      gap: 0 1rem;
    }
    .row mat-form-field {
      flex: 1 1 14rem;
    }
    fieldset {
      display: grid;
      gap: 0.75rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProposalEditor implements OnInit {
  private readonly api = inject(ProposalApi);

  readonly estimateId = input.required<string>();
  /** the draft to change; none makes a new version */
  readonly draft = input<ProposalVersionView | null>(null);
  /** the estimate's notes for the client: a new version's Notes start from them */
  readonly clientNotes = input<string | undefined>('');
  readonly saved = output<ProposalVersionView>();
  readonly cancelled = output<void>();

  protected readonly form = proposalForm();
  protected readonly isHydrated = hydratedSignal();
  protected readonly isSaving = signal(false);
  protected readonly message = signal<string | null>(null);
  protected readonly words = PROPOSAL_WORDS;
  protected readonly progressHint = PROGRESS_PAYMENT_HINT;
  protected readonly errorText = errorText;
  protected readonly maxExclusions = MAX_EXCLUSIONS;
  protected readonly maxText = MAX_TEXT;
  protected readonly headingId = computed(() => `proposal-editor-${this.draft()?.id ?? 'new'}`);

  ngOnInit(): void {
    const draft = this.draft();
    if (draft) fillProposal(this.form, draft.snapshot);
    else startNewProposal(this.form, this.clientNotes());
  }

  protected async save(): Promise<void> {
    this.message.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.message.set('Some fields need attention; the messages are beside them.');
      return;
    }
    const body = readProposal(this.form);
    const draft = this.draft();
    this.isSaving.set(true);
    try {
      this.saved.emit(draft ? await this.api.update(draft.id, body) : await this.api.create({ estimateId: this.estimateId(), ...body }));
    } catch (error) {
      this.message.set(applyProblem(this.form, placeExclusionErrors(toProblem(error))));
    } finally {
      this.isSaving.set(false);
    }
  }
}
