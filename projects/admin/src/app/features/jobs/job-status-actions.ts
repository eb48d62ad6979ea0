import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { JOB_CANCEL_REASON_MAX, type JobDetail, type JobStatusChange } from '@layerbook/contracts/types';
import { TranslatePipe } from '@ngx-translate/core';
import { firstValueFrom } from 'rxjs';
import { FieldErrorPipe } from '../../../../../shared/forms/field-error-pipe';
import { Submission } from '../../shared/forms/submission';
import { FormAlert } from '../../shared/ui/form-alert';

/**
 * What the office can do with a job as a whole: mark it finished, reopen a finished one, or cancel
 * one called off (with a reason; the server refuses while an invoice of it stands and says which).
 * A cancelled job says so and offers nothing.
 */
@Component({
  selector: 'lb-job-status-actions',
  imports: [
    FieldErrorPipe,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    ReactiveFormsModule,
    TranslatePipe,
  ],
  template: `
    <lb-form-alert [message]="submission.message()" />
    @switch (job().status) {
      @case ('cancelled') {
        <p class="note" role="note"><mat-icon aria-hidden="true">block</mat-icon>{{ 'jobs.jobStatus.cancelledNote' | translate }}</p>
      }
      @case ('complete') {
        <div class="actions">
          <button mat-stroked-button type="button" [disabled]="submission.isBusy()" (click)="move({ status: 'in_progress' })">
            <mat-icon aria-hidden="true">undo</mat-icon>{{ 'jobs.jobStatus.reopen' | translate }}
          </button>
        </div>
      }
      @default {
        @if (cancelling()) {
          <form [formGroup]="form" (ngSubmit)="cancel()" novalidate>
            <fieldset class="lb-form">
              <legend>{{ 'jobs.jobStatus.cancelHeading' | translate }}</legend>
              <p class="muted">{{ 'jobs.jobStatus.cancelIntro' | translate }}</p>
              <mat-form-field>
                <mat-label>{{ 'jobs.jobStatus.reason' | translate }}</mat-label>
                <textarea matInput formControlName="reason" rows="2" [attr.maxlength]="reasonMax" required></textarea>
                <mat-error>{{ form.controls.reason | lbFieldError: words.reason }}</mat-error>
              </mat-form-field>
              <div class="actions">
                <button mat-flat-button type="submit" [disabled]="submission.isBusy()">
                  {{ 'jobs.jobStatus.confirmCancel' | translate }}
                </button>
                <button mat-button type="button" (click)="cancelling.set(false)">{{ 'jobs.jobStatus.keepJob' | translate }}</button>
              </div>
            </fieldset>
          </form>
        } @else {
          <div class="actions">
            <button mat-stroked-button type="button" [disabled]="submission.isBusy()" (click)="move({ status: 'complete' })">
              <mat-icon aria-hidden="true">task_alt</mat-icon>{{ 'jobs.jobStatus.markFinished' | translate }}
            </button>
            <button mat-button type="button" (click)="cancelling.set(true)">{{ 'jobs.jobStatus.cancelJob' | translate }}</button>
          </div>
        }
      }
    }
  `,
  styles: `
    :host {
      display: block;
      margin: 0 0 1rem;
    }
    .actions {
      display: flex;
      flex-wrap: wrap;
      gap: 0.5rem;
    }
    .note {
      display: flex;
      align-items: center;
      gap: 0.4rem;
      margin: 0;
    }
    .muted {
      color: var(--mat-sys-on-surface-variant);
    }
    mat-form-field {
      width: 100%;
      max-width: 36rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class JobStatusActions {
  private readonly http = inject(HttpClient);

  readonly job = input.required<JobDetail>();
  /** the job as the server answered the move */
  readonly changed = output<JobDetail>();

  protected readonly cancelling = signal(false);
  protected readonly reasonMax = JOB_CANCEL_REASON_MAX;
  protected readonly form = inject(NonNullableFormBuilder).group({
    reason: ['', [Validators.required, Validators.maxLength(JOB_CANCEL_REASON_MAX)]],
  });
  protected readonly submission = new Submission();
  /** No fields to check for finishing or reopening (an always-valid form stands in). */
  private readonly noForm = inject(NonNullableFormBuilder).group({});
  protected readonly words = {
    reason: {
      required: 'jobs.jobStatus.reasonRequired',
      maxlength: { key: 'jobs.jobStatus.reasonTooLong', params: { max: JOB_CANCEL_REASON_MAX } },
    },
  };

  protected move(change: JobStatusChange): Promise<void> {
    return this.send(change, this.noForm);
  }

  protected cancel(): Promise<void> {
    return this.send({ status: 'cancelled', reason: this.form.getRawValue().reason.trim() }, this.form);
  }

  private async send(change: JobStatusChange, form: typeof this.form | typeof this.noForm): Promise<void> {
    const answer = await this.submission.send(form, () =>
      firstValueFrom(this.http.post<JobDetail>(`/api/jobs/${encodeURIComponent(this.job().id)}/status`, change)),
    );
    if (answer) {
      this.cancelling.set(false);
      this.form.reset();
      this.changed.emit(answer);
    }
  }
}
