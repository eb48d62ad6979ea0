import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { PROPOSAL_COMMENT_MAX, type PortalProposal } from '@layerbook/contracts/types';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { ProposalApi } from './proposal-api';
import { TranslatePipe } from '@ngx-translate/core';
import { FieldErrorPipe, type FieldErrorWords } from '../../../../../shared/forms/field-error-pipe';

type Mode = 'changes' | 'decline' | null;

/** The other answers: ask for changes (a comment is needed) or decline (a comment is optional). */
@Component({
  selector: 'lb-answer-forms',
  imports: [FieldErrorPipe, FormAlert, MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, TranslatePipe],
  template: `
    <div class="lb-form-actions">
      <button
        mat-stroked-button
        type="button"
        [disabled]="!isHydrated()"
        [attr.aria-expanded]="mode() === 'changes'"
        (click)="open('changes')"
      >
        {{ 'proposals.answers.askChanges' | translate }}
      </button>
      <button mat-button type="button" [disabled]="!isHydrated()" [attr.aria-expanded]="mode() === 'decline'" (click)="open('decline')">
        {{ 'proposals.answers.decline' | translate }}
      </button>
    </div>
    @if (mode() === 'changes') {
      <form
        [formGroup]="changes"
        (ngSubmit)="sendChanges()"
        novalidate
        class="panel"
        [attr.aria-label]="'proposals.answers.askChanges' | translate"
      >
        <fieldset class="lb-gate lb-form" [disabled]="isBusy()">
          <lb-form-alert [message]="formMessage()" />
          <mat-form-field>
            <mat-label>{{ 'proposals.answers.changesLabel' | translate }}</mat-label>
            <textarea matInput formControlName="comment" rows="4" [maxlength]="commentMax" required></textarea>
            <mat-error>{{ changes.controls.comment | lbFieldError: words }}</mat-error>
          </mat-form-field>
          <div class="lb-form-actions">
            <button mat-flat-button type="submit">{{ 'proposals.answers.send' | translate }}</button>
          </div>
        </fieldset>
      </form>
    }
    @if (mode() === 'decline') {
      <form
        [formGroup]="decline"
        (ngSubmit)="sendDecline()"
        novalidate
        class="panel"
        [attr.aria-label]="'proposals.answers.declineLabel' | translate"
      >
        <fieldset class="lb-gate lb-form" [disabled]="isBusy()">
          <lb-form-alert [message]="formMessage()" />
          <mat-form-field>
            <mat-label>{{ 'proposals.answers.declineComment' | translate }}</mat-label>
            <textarea matInput formControlName="comment" rows="3" [maxlength]="commentMax"></textarea>
            <mat-error>{{ decline.controls.comment | lbFieldError: words }}</mat-error>
          </mat-form-field>
          <div class="lb-form-actions">
            <button mat-flat-button type="submit">{{ 'proposals.answers.declineSubmit' | translate }}</button>
          </div>
        </fieldset>
      </form>
    }
  `,
  styles: `
    .panel {
      margin-top: 1rem;
      max-width: 40rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AnswerForms {
  private readonly api = inject(ProposalApi);
  private readonly fb = inject(NonNullableFormBuilder);

  readonly proposal = input.required<PortalProposal>();
  readonly decided = output<PortalProposal>();

  protected readonly mode = signal<Mode>(null);
  protected readonly changes = this.fb.group({ comment: ['', [requiredText, Validators.maxLength(PROPOSAL_COMMENT_MAX)]] });
  protected readonly decline = this.fb.group({ comment: ['', Validators.maxLength(PROPOSAL_COMMENT_MAX)] });
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly isHydrated = hydratedSignal();
  protected readonly words: FieldErrorWords = {
    required: 'proposals.answers.changesRequired',
    maxlength: { key: 'proposals.answers.tooLong', params: { max: PROPOSAL_COMMENT_MAX } },
  };
  protected readonly commentMax = PROPOSAL_COMMENT_MAX;

  protected open(mode: Mode): void {
    this.formMessage.set(null);
    this.mode.set(this.mode() === mode ? null : mode);
  }

  protected sendChanges(): Promise<void> {
    return this.send(this.changes, () =>
      this.api.requestChanges(this.proposal().id, { comment: this.changes.getRawValue().comment.trim() }),
    );
  }

  protected sendDecline(): Promise<void> {
    const comment = this.decline.getRawValue().comment.trim();
    return this.send(this.decline, () => this.api.decline(this.proposal().id, comment ? { comment } : {}));
  }

  private async send(form: typeof this.changes, call: () => Promise<PortalProposal>): Promise<void> {
    this.formMessage.set(null);
    if (form.invalid) {
      form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      this.decided.emit(await call());
    } catch (error) {
      this.formMessage.set(applyProblem(form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }
}
