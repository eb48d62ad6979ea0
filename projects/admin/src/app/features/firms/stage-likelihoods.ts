import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSnackBar } from '@angular/material/snack-bar';
import {
  INQUIRY_STAGES,
  STAGE_LABELS,
  type InquiryStage,
  type ItemList,
  type StageLikelihood,
  type StageLikelihoodUpdate,
} from '@layerbook/contracts/types';
import { Session } from '../../core/auth/session';
import { errorText } from '../../shared/forms/error-text';
import { fillWhenLoaded } from '../../shared/forms/fill-when-loaded';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { loadMessage } from '../../shared/forms/load-message';
import { Submission } from '../../shared/forms/submission';
import { FormAlert } from '../../shared/ui/form-alert';
import { FirmApi } from './firm-api';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';

type LikelihoodControls = Record<InquiryStage, FormControl<number | null>>;

/**
 * How likely each stage is to end in work, which weights the pipeline on Today and in the cash
 * forecast. The owner sets it; the office can read it.
 */
@Component({
  selector: 'lb-stage-likelihoods',
  imports: [TranslatePipe, FormAlert, MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule],
  template: `
    <form [formGroup]="form" (ngSubmit)="saveLikelihoods()" novalidate aria-labelledby="likelihood-heading">
      <fieldset class="lb-gate" [disabled]="!isHydrated()">
        <h2 id="likelihood-heading">{{ 'firms.stageLikelihoods.stageOdds' | translate }}</h2>
        <p class="lead">
          {{ 'firms.stageLikelihoods.outOf100Inquiries' | translate }}
        </p>
        <lb-form-alert [message]="message()" />
        @if (hasLoaded()) {
          <div class="fields" formGroupName="likelihoods">
            @for (stage of stages; track stage) {
              <mat-form-field>
                <mat-label>{{ stageLabels[stage] }}</mat-label>
                <input matInput type="number" min="0" max="100" step="1" [formControlName]="stage" required />
                <span matTextSuffix>%</span>
                <mat-error>{{ errorText(form.controls.likelihoods.controls[stage], words) }}</mat-error>
              </mat-form-field>
            }
          </div>
          @if (isOwner()) {
            <div class="lb-form-actions">
              <button mat-flat-button type="submit" [disabled]="submission.isBusy()">
                {{ 'firms.stageLikelihoods.saveLikelihoods' | translate }}
              </button>
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
  private readonly api = inject(FirmApi);
  private readonly snackBar = inject(MatSnackBar);
  private readonly translate = inject(TranslateService);

  protected readonly isOwner = inject(Session).isOwner;
  protected readonly stages = INQUIRY_STAGES;
  protected readonly stageLabels = STAGE_LABELS;
  protected readonly isHydrated = hydratedSignal();
  protected readonly likelihoods = httpResource<ItemList<StageLikelihood>>(() => '/api/inquiries/stages');
  protected readonly hasLoaded = computed(() => this.likelihoods.hasValue());
  private readonly loadFailure = loadMessage(this.likelihoods);
  protected readonly submission = new Submission();
  protected readonly message = computed(() => this.submission.message() ?? this.loadFailure());
  protected readonly errorText = errorText;
  protected readonly words = {
    required: 'Enter a percentage from 0 to 100.',
    min: 'Use 0 to 100.',
    max: 'Use 0 to 100.',
  };

  /** Shaped like the API's body, so its field names ("likelihoods.samples") find their controls. */
  protected readonly form = new FormGroup({
    likelihoods: new FormGroup(
      Object.fromEntries(
        INQUIRY_STAGES.map((stage) => [
          stage,
          new FormControl<number | null>(null, [Validators.required, Validators.min(0), Validators.max(100)]),
        ]),
      ) as LikelihoodControls,
    ),
  });

  constructor() {
    fillWhenLoaded(this.likelihoods, ({ items }) => {
      this.form.reset({ likelihoods: Object.fromEntries(items.map((item) => [item.stage, item.likelihoodPercent])) });
      if (this.isOwner()) {
        this.form.enable();
      } else {
        this.form.disable();
      }
    });
  }

  protected async saveLikelihoods(): Promise<void> {
    // Validators.required has passed, so every stage holds a number.
    const body = this.form.getRawValue() as StageLikelihoodUpdate;
    const saved = await this.submission.send(this.form, () => this.api.saveStageLikelihoods(body));
    if (saved) {
      this.likelihoods.set(saved);
      this.snackBar.open(this.translate.instant('firms.snack.oddsSaved') as string, this.translate.instant('ui.snack.close') as string, {
        duration: 4000,
      });
    }
  }
}
