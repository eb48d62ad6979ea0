import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { takeUntilDestroyed, toObservable } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectChange, MatSelectModule } from '@angular/material/select';
import { TranslatePipe } from '@ngx-translate/core';
import type { EngineRoom } from '@layerbook/contracts/types';
import type { FinishSystem } from '@layerbook/domain';
import { map, startWith, switchMap } from 'rxjs';
import { errorText } from '../../shared/forms/error-text';
import type { OptionGroup } from './estimate-form';
import { finishOutlineText } from './estimate-words';

/** Which finish goes on each measured surface in one option, room by room. */
@Component({
  selector: 'lb-surface-finishes',
  imports: [MatFormFieldModule, MatSelectModule, ReactiveFormsModule, TranslatePipe],
  template: `
    @for (room of rooms(); track room.id) {
      <fieldset class="room" [attr.aria-labelledby]="'room-' + room.id">
        <legend [id]="'room-' + room.id">{{ room.name }}{{ room.isExterior ? ('proposals.finishes.outside' | translate) : '' }}</legend>
        @if (room.surfaces.length > 1) {
          <mat-form-field class="whole-room">
            <mat-label>{{ 'proposals.finishes.wholeRoom' | translate }}</mat-label>
            <mat-select [formControl]="roomControl(room.id)" (selectionChange)="finishWholeRoom(room, $event)">
              <mat-option value="">{{ 'proposals.finishes.notInOption' | translate }}</mat-option>
              @for (system of finishSystems(); track system.id) {
                <mat-option [value]="system.id">{{ system.name }}</mat-option>
              }
            </mat-select>
          </mat-form-field>
        }
        @for (surface of room.surfaces; track surface.id) {
          <div class="surface">
            <mat-form-field>
              <mat-label>{{ 'proposals.finishes.finishFor' | translate: { name: surface.name } }}</mat-label>
              <mat-select [formControl]="option().controls.finishes.controls[surface.id]!">
                <!-- The closed select shows the name only; the open list adds each finish's summary. -->
                <mat-select-trigger>{{
                  names().get(option().controls.finishes.controls[surface.id]!.value) ?? ('proposals.finishes.notInOption' | translate)
                }}</mat-select-trigger>
                <mat-option value="">{{ 'proposals.finishes.notInOption' | translate }}</mat-option>
                @for (system of finishSystems(); track system.id) {
                  <mat-option [value]="system.id"
                    >{{ system.name }} <span class="outline">· {{ outlines().get(system.id) }}</span></mat-option
                  >
                }
              </mat-select>
              <mat-hint>{{ measures().get(surface.id) }}</mat-hint>
              <mat-error>{{ errorText(option().controls.finishes.controls[surface.id]!, {}) }}</mat-error>
            </mat-form-field>
            @if (notes().get('surface:' + surface.id); as note) {
              <p class="field-note" role="alert">{{ note }}</p>
            }
          </div>
        }
      </fieldset>
    }
  `,
  styles: `
    .room {
      margin: 0 0 1rem;
      padding: 0.5rem 0.75rem 0.25rem;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 8px;
      min-width: 0;
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(14rem, 1fr));
      gap: 0.75rem;
    }
    legend {
      font-weight: 600;
      padding: 0 0.25rem;
    }
    .whole-room {
      grid-column: 1 / -1;
    }
    mat-form-field {
      width: 100%;
    }
    .outline {
      color: var(--mat-sys-on-surface-variant);
      font-size: 0.9em;
    }
    .field-note {
      margin: 0.25rem 0 0;
      color: var(--mat-sys-error);
      font-size: 0.9rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SurfaceFinishes {
  readonly option = input.required<OptionGroup>();
  readonly rooms = input.required<readonly EngineRoom[]>();
  readonly finishSystems = input.required<readonly FinishSystem[]>();
  /** surface id → "504.49 ft²" */
  readonly measures = input.required<ReadonlyMap<string, string>>();
  /** live engine messages, keyed "surface:<id>" */
  readonly notes = input.required<ReadonlyMap<string, string>>();

  protected readonly errorText = errorText;
  /** finish system id → "3 layers · waits 28 h", the library's summary beside each choice */
  protected readonly outlines = computed(() => new Map(this.finishSystems().map((f) => [f.id, finishOutlineText(f.layers)])));
  protected readonly names = computed(() => new Map(this.finishSystems().map((f) => [f.id, f.name])));
  /** room id → the shortcut select, showing the room's finish when every surface shares it */
  private readonly roomControls = new Map<string, FormControl<string | null>>();

  constructor() {
    toObservable(this.option)
      .pipe(
        switchMap((option) =>
          option.controls.finishes.valueChanges.pipe(
            startWith(null),
            map(() => option.controls.finishes.getRawValue()),
          ),
        ),
        takeUntilDestroyed(),
      )
      .subscribe((finishes) => {
        for (const room of this.rooms()) {
          const values = new Set(room.surfaces.map((s) => finishes[s.id] ?? ''));
          this.roomControl(room.id).setValue(values.size === 1 ? [...values][0] : null, { emitEvent: false });
        }
      });
  }

  protected roomControl(roomId: string): FormControl<string | null> {
    let control = this.roomControls.get(roomId);
    if (!control) {
      control = new FormControl<string | null>(null);
      this.roomControls.set(roomId, control);
    }
    return control;
  }

  protected finishWholeRoom(room: EngineRoom, change: MatSelectChange<string>): void {
    const controls = this.option().controls.finishes.controls;
    for (const s of room.surfaces) {
      controls[s.id]?.setValue(change.value);
      controls[s.id]?.markAsDirty();
    }
  }
}
