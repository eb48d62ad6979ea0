import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatRadioChange, MatRadioModule } from '@angular/material/radio';
import { TranslatePipe } from '@ngx-translate/core';
import type { FinishSystem } from '@layerbook/domain';
import { errorText } from '../../shared/forms/error-text';
import {
  type CostLineKind,
  type DiscountKind,
  type EstimateForm,
  MAX_LINES,
  WORDS,
  addOnGroup,
  costLineGroup,
  nextAddOnId,
  showDiscountKind,
} from './estimate-form';

/** Each kind's words are under `proposals.extras.<kind>` (heading, row, remove, add, hint). */
const COST_LINES: readonly CostLineKind[] = ['equipment', 'subcontracts', 'sundries'];

/** The extras of an estimate: add-ons, cost lines, discount and the per-area comparison rates. */
@Component({
  selector: 'lb-extras-fields',
  imports: [MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatRadioModule, ReactiveFormsModule, TranslatePipe],
  templateUrl: './extras-fields.html',
  styleUrl: './extras-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ExtrasFields {
  readonly form = input.required<EstimateForm>();
  readonly finishSystems = input.required<readonly FinishSystem[]>();
  readonly lengthUnit = input.required<'ft' | 'm'>();
  readonly currency = input.required<string>();
  /** live engine messages keyed by form path ("discount.amount", "addOns.0.materialsCost") */
  readonly notes = input.required<ReadonlyMap<string, string>>();
  readonly revision = input.required<number>();

  protected readonly errorText = errorText;
  protected readonly words = WORDS;
  protected readonly costLines = COST_LINES;
  protected readonly maxLines = MAX_LINES;

  protected addAddOn(): void {
    const addOns = this.form().controls.addOns;
    if (addOns.length >= MAX_LINES) return;
    addOns.push(addOnGroup(nextAddOnId(addOns.controls.map((c) => c.controls.id.value))));
  }

  protected removeAddOn(index: number): void {
    this.form().controls.addOns.removeAt(index);
  }

  protected addCostLine(kind: CostLineKind): void {
    const lines = this.form().controls[kind];
    if (lines.length < MAX_LINES) lines.push(costLineGroup());
  }

  protected removeCostLine(kind: CostLineKind, index: number): void {
    this.form().controls[kind].removeAt(index);
  }

  protected chooseDiscount(change: MatRadioChange<DiscountKind>): void {
    showDiscountKind(this.form(), change.value);
    this.form().controls.discount.updateValueAndValidity();
  }
}
