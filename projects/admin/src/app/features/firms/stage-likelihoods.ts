import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSnackBar } from '@angular/material/snack-bar';
import type { InquiryStage } from '@layerbook/contracts';
import { firstValueFrom } from 'rxjs';
import { Session } from '../../core/auth/session';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { FormAlert } from '../../shared/ui/form-alert';
import { INQUIRY_STAGES, STAGE_LABELS } from '../../shared/ui/stage-words';

interface StageLikelihoods {
  readonly likelihoods: Record<InquiryStage, number>;
}

type LikelihoodControls = Record<InquiryStage, FormControl<number | null>>;

/**
 * How likely each stage is to end in work, which weights the pipeline on Today and in the cash
 * forecast. The owner sets it; the office can read it.
 */
@Component({
  selector: 'lb-stage-likelihoods',
  imports: [FormAlert, MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule],
  template: `
    <form [formGroup]="form" (ngSubmit)="saveLikelihoods()" novalidate aria-labelledby="likelihood-heading">
      <fieldset class="lb-gate" [disabled]="!isHydrated()">
        <h2 id="likelihood-heading">Chance of winning by stage</h2>
        <p class="lead">
          Each open inquiry's estimated value is multiplied by its stage's chance to give the weighted
          pipeline. Set these from your own record, for example how many sample boards turn into jobs.
        </p>
        <lb-form-alert [message]="formMessage()" />
        @if (hasLoaded()) {
          <div class="fields">
            @for (stage of stages; track stage) {
              <mat-form-field>
                <mat-label>{{ stageLabels[stage] }}</mat-label>
                <input matInput type="number" min="0" max="100" step="1" [formControlName]="stage" required />
                <span matTextSuffix>%</span>
                <mat-error>{{ errorText(form.controls[stage], words) }}</mat-error>
              </mat-form-field>
            }
          </div>
          @if (isOwner()) {
            <div class="lb-form-actions">
              <button mat-flat-button type="submit" [disabled]="isBusy()">Save likelihoods</button>
            </div>
          }
        }
      </fieldset>
    </form>
  `,
  styles: `
    form {
      margin-top: 1rem;
      padding: 0.25rem 1.25rem 1.25rem;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
    }
    h2 {
      margin-top: 0.75rem;
    }
    .lead {
      color: var(--mat-sys-on-surface-variant);
    }
    .fields {
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(11rem, 1fr));
      gap: 1rem;
      align-items: start;
      margin-bottom: 0.75rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StageLikelihoodsForm {
  private readonly http = inject(HttpClient);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly isOwner = inject(Session).isOwner;
  protected readonly stages = INQUIRY_STAGES;
  protected readonly stageLabels = STAGE_LABELS;
  protected readonly isHydrated = hydratedSignal();
  protected readonly hasLoaded = signal(false);
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly words = {
    required: 'Enter a percentage from 0 to 100.',
    min: 'Use 0 to 100.',
    max: 'Use 0 to 100.',
  };

  protected readonly form = new FormGroup(
    Object.fromEntries(
      INQUIRY_STAGES.map((stage) => [
        stage,
        new FormControl<number | null>(null, [Validators.required, Validators.min(0), Validators.max(100)]),
      ]),
    ) as LikelihoodControls,
  );

  constructor() {
    void this.load();
  }

  protected async saveLikelihoods(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const likelihoods = this.form.getRawValue() as Record<InquiryStage, number>;
      const saved = await firstValueFrom(
        this.http.put<StageLikelihoods>('/api/inquiries/stages', { likelihoods }),
      );
      this.show(saved);
      this.snackBar.open('Chances of winning saved.', 'Close', { duration: 4000 });
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, this.withStagePaths(toProblem(error))));
    } finally {
      this.isBusy.set(false);
    }
  }

  private async load(): Promise<void> {
    try {
      this.show(await firstValueFrom(this.http.get<StageLikelihoods>('/api/inquiries/stages')));
      this.hasLoaded.set(true);
    } catch (error) {
      this.formMessage.set(toProblem(error).title);
    }
  }

  private show({ likelihoods }: StageLikelihoods): void {
    this.form.reset(likelihoods);
    if (this.isOwner()) {
      this.form.enable();
    } else {
      this.form.disable();
    }
  }

  /** The API names fields "likelihoods.samples"; the form's controls are just "samples". */
  private withStagePaths<T extends { errors?: readonly { field: string; message: string }[] }>(problem: T): T {
    return {
      ...problem,
      errors: problem.errors?.map((e) => ({ ...e, field: e.field.replace(/^likelihoods\./, '') })),
    };
  }
}
