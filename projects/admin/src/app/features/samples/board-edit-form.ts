import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, output, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { TranslatePipe } from '@ngx-translate/core';
import {
  SAMPLE_LABEL_MAX,
  SAMPLE_NOTES_MAX,
  type FinishSystemSummary,
  type ItemList,
  type SampleBoardUpdate,
  type SampleBoardView,
} from '@layerbook/contracts/types';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { finishChoiceWords } from './finish-words';
import { FINISH_SYSTEMS_URL, SampleApi } from './sample-api';

const ERROR_WORDS = { required: 'samples.newBoard.labelRequired', maxlength: 'samples.newBoard.tooLong' };

/**
 * Changes a board as the server allows: while it is being made, its label, finish and notes; once
 * the client has seen it, only the notes (the office's own, never shown to the client). Sends only
 * what changed.
 */
@Component({
  selector: 'lb-board-edit-form',
  imports: [FormAlert, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule, ReactiveFormsModule, TranslatePipe],
  template: `
    <form [formGroup]="form" (ngSubmit)="save()" novalidate aria-labelledby="board-edit-heading">
      <h2 id="board-edit-heading">{{ (isDraft() ? 'samples.edit.headingBoard' : 'samples.edit.headingNotes') | translate }}</h2>
      @if (isDraft()) {
        <mat-form-field>
          <mat-label>{{ 'samples.newBoard.label' | translate }}</mat-label>
          <input matInput formControlName="label" [maxlength]="labelMax" />
          <mat-hint>{{ 'samples.newBoard.labelHint' | translate }}</mat-hint>
          <mat-error>{{ fieldError('label') | translate }}</mat-error>
        </mat-form-field>

        <mat-form-field>
          <mat-label>{{ 'samples.newBoard.finish' | translate }}</mat-label>
          <mat-select formControlName="finishSystemId">
            <mat-option [value]="''">{{ 'samples.newBoard.notChosen' | translate }}</mat-option>
            @if (keptFinish(); as kept) {
              <mat-option [value]="kept.id">{{ 'samples.edit.finishAsOnBoard' | translate: { name: kept.name } }}</mat-option>
            }
            @for (f of systems(); track f.id) {
              @let choice = finishChoice(f.name, f.layerCount);
              <mat-option [value]="f.id">{{ choice.key | translate: choice.params }}</mat-option>
            }
          </mat-select>
          <mat-hint>{{ 'samples.edit.finishHint' | translate }}</mat-hint>
          <mat-error>{{ fieldError('finishSystemId') | translate }}</mat-error>
        </mat-form-field>
      } @else {
        <p class="muted">{{ 'samples.edit.seenNote' | translate }}</p>
      }

      <mat-form-field>
        <mat-label>{{ 'samples.newBoard.notes' | translate }}</mat-label>
        <textarea matInput formControlName="notes" rows="4" [maxlength]="notesMax"></textarea>
        <mat-hint>{{ 'samples.newBoard.notesHint' | translate }}</mat-hint>
        <mat-error>{{ fieldError('notes') | translate }}</mat-error>
      </mat-form-field>

      <lb-form-alert [message]="message()" />
      <div class="actions">
        <button mat-flat-button type="submit" [disabled]="isSaving()">{{ 'samples.edit.save' | translate }}</button>
        <button mat-button type="button" (click)="cancelled.emit()">{{ 'samples.newBoard.cancel' | translate }}</button>
      </div>
    </form>
  `,
  styles: `
    form {
      display: grid;
      gap: 0.75rem;
      max-width: 36rem;
      margin: 1rem 0;
    }
    h2 {
      margin: 0;
    }
    .actions {
      display: flex;
      gap: 0.75rem;
    }
    .muted {
      opacity: 0.8;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardEditForm implements OnInit {
  private readonly api = inject(SampleApi);

  readonly board = input.required<SampleBoardView>();
  readonly saved = output<SampleBoardView>();
  readonly cancelled = output<void>();

  protected readonly isDraft = computed(() => this.board().status === 'draft');
  // The library is read only when the finish can still be chosen.
  private readonly systemList = httpResource<ItemList<FinishSystemSummary>>(() => (this.isDraft() ? FINISH_SYSTEMS_URL : undefined));
  protected readonly systems = computed<readonly FinishSystemSummary[]>(() =>
    this.systemList.hasValue() ? this.systemList.value().items : [],
  );
  /** the board's finish when the library no longer lists it (archived): still offered, so keeping it is a choice */
  protected readonly keptFinish = computed(() => {
    const finish = this.board().finish;
    if (!finish || !this.systemList.hasValue() || this.systems().some((s) => s.id === finish.systemId)) return null;
    return { id: finish.systemId, name: finish.systemName };
  });
  protected readonly finishChoice = finishChoiceWords;
  protected readonly labelMax = SAMPLE_LABEL_MAX;
  protected readonly notesMax = SAMPLE_NOTES_MAX;
  protected readonly message = signal<string | null>(null);
  protected readonly isSaving = signal(false);

  protected readonly form = new FormGroup({
    label: new FormControl('', { nonNullable: true, validators: [requiredText, Validators.maxLength(SAMPLE_LABEL_MAX)] }),
    finishSystemId: new FormControl('', { nonNullable: true }),
    notes: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(SAMPLE_NOTES_MAX)] }),
  });

  ngOnInit(): void {
    const b = this.board();
    this.form.setValue({ label: b.label, finishSystemId: b.finishSystemId ?? '', notes: b.notes });
  }

  protected fieldError(name: keyof typeof this.form.controls): string {
    return errorText(this.form.controls[name], ERROR_WORDS);
  }

  protected async save(): Promise<void> {
    this.message.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const changes = this.changes();
    if (Object.keys(changes).length === 0) {
      this.cancelled.emit();
      return;
    }
    this.isSaving.set(true);
    try {
      this.saved.emit(await this.api.update(this.board().id, changes));
    } catch (error) {
      this.message.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isSaving.set(false);
    }
  }

  /** What differs from the board, and only what the board's state lets change. */
  private changes(): SampleBoardUpdate {
    const b = this.board();
    const v = this.form.getRawValue();
    const label = v.label.trim();
    return {
      ...(this.isDraft() && label !== b.label ? { label } : {}),
      ...(this.isDraft() && v.finishSystemId !== (b.finishSystemId ?? '') ? { finishSystemId: v.finishSystemId || null } : {}),
      ...(v.notes !== b.notes ? { notes: v.notes } : {}),
    };
  }
}
