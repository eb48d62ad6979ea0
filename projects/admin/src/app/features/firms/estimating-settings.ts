import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import type { EstimatingSettings } from '@layerbook/contracts';
import { firstValueFrom, map, startWith } from 'rxjs';
import { Session } from '../../core/auth/session';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { FormAlert } from '../../shared/ui/form-alert';
import { estimatingForm, fillForm, methodInWords, readForm, WEEKDAYS } from './estimating-form';

interface EstimatingView {
  readonly settings: EstimatingSettings;
  readonly isDefault: boolean;
  readonly lengthUnit: 'ft' | 'm';
  readonly currency: string;
}

/**
 * The numbers every estimate is built from: labour rate, overhead and profit, minimum charge, tax,
 * rounding, the working calendar and the labour multipliers. The owner sets them; office reads.
 */
@Component({
  selector: 'lb-estimating-settings',
  imports: [FormAlert, MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatInputModule, MatRadioModule, MatSelectModule, ReactiveFormsModule],
  templateUrl: './estimating-settings.html',
  styleUrl: './estimating-settings.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EstimatingSettingsForm {
  private readonly http = inject(HttpClient);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly isOwner = inject(Session).isOwner;
  protected readonly isHydrated = hydratedSignal();
  protected readonly view = signal<EstimatingView | null>(null);
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly weekdays = WEEKDAYS;
  protected readonly words = { required: 'Enter a value.', min: 'Too small.', max: 'Too large.', pattern: 'Enter an amount like 55.00.' };
  protected readonly form = estimatingForm();

  private readonly overheadProfit = toSignal(
    this.form.controls.overheadProfit.valueChanges.pipe(
      startWith(null),
      map(() => this.form.controls.overheadProfit.getRawValue()),
    ),
  );
  protected readonly methodWords = computed(() => {
    const op = this.overheadProfit();
    return op ? methodInWords(op.method, op.overheadPercent ?? 0, op.profitPercent ?? 0) : '';
  });
  protected readonly roundingKind = toSignal(this.form.controls.rounding.controls.kind.valueChanges, { initialValue: 'minorUnit' as const });

  constructor() {
    void this.load();
  }

  protected async saveEstimating(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isBusy.set(true);
    try {
      const saved = await firstValueFrom(this.http.put<EstimatingView>('/api/firm/estimating', readForm(this.form)));
      this.show(saved);
      this.snackBar.open('Pricing and schedule settings saved.', 'Close', { duration: 4000 });
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }

  private async load(): Promise<void> {
    try {
      this.show(await firstValueFrom(this.http.get<EstimatingView>('/api/firm/estimating')));
    } catch (error) {
      this.formMessage.set(toProblem(error).title);
    }
  }

  private show(view: EstimatingView): void {
    this.view.set(view);
    fillForm(this.form, view.settings);
    if (this.isOwner()) this.form.enable();
    else this.form.disable();
  }
}
