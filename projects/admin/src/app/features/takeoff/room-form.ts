import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { TranslatePipe } from '@ngx-translate/core';
import { TAKEOFF_LIMITS as L, type RoomView } from '@layerbook/contracts/types';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { TakeoffApi } from './takeoff-api';

/** Adds a room (or an outside elevation) to a site, or renames the one it is given. */
@Component({
  selector: 'lb-room-form',
  imports: [FormAlert, MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, TranslatePipe],
  template: `
    <form
      [formGroup]="form"
      (ngSubmit)="saveRoom()"
      novalidate
      [attr.aria-label]="
        isNew() ? ('takeoff.roomForm.addForm' | translate) : ('takeoff.roomForm.editForm' | translate: { name: room()?.name })
      "
    >
      <fieldset class="lb-gate fields" [disabled]="!isHydrated()">
        <lb-form-alert [message]="formMessage()" />
        <mat-form-field>
          <mat-label>{{ 'takeoff.roomForm.name' | translate }}</mat-label>
          <input matInput formControlName="name" autocomplete="off" required />
          <mat-hint>{{ 'takeoff.roomForm.nameHint' | translate }}</mat-hint>
          <mat-error>{{ errorText(form.controls.name, words.name) }}</mat-error>
        </mat-form-field>
        <mat-checkbox formControlName="isExterior">{{ 'takeoff.roomForm.isExterior' | translate }}</mat-checkbox>
        <mat-form-field class="wide">
          <mat-label>{{ 'takeoff.roomForm.notes' | translate }}</mat-label>
          <textarea matInput formControlName="notes" rows="2"></textarea>
          <mat-error>{{ errorText(form.controls.notes, words.notes) }}</mat-error>
        </mat-form-field>
        <div class="lb-form-actions">
          <button mat-flat-button type="submit" [disabled]="isBusy()">
            {{ (isNew() ? 'takeoff.roomForm.add' : 'takeoff.roomForm.save') | translate }}
          </button>
          <button mat-button type="button" (click)="cancelled.emit()">{{ 'takeoff.cancel' | translate }}</button>
        </div>
      </fieldset>
    </form>
  `,
  styles: `
    .fields {
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(14rem, 1fr));
      gap: 0.75rem;
      align-items: center;
    }
    .wide,
    lb-form-alert,
    .lb-form-actions {
      grid-column: 1 / -1;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RoomForm implements OnInit {
  private readonly api = inject(TakeoffApi);

  readonly siteId = input.required<string>();
  readonly room = input<RoomView | null>(null);
  readonly saved = output<RoomView>();
  readonly cancelled = output<void>();

  protected readonly isNew = computed(() => this.room() === null);
  protected readonly isHydrated = hydratedSignal();
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly errorText = errorText;
  protected readonly words = {
    name: { required: 'Enter the room name.', maxlength: `Use at most ${L.roomNameMax} characters.` },
    notes: { maxlength: `Use at most ${L.notesMax} characters.` },
  };

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [requiredText, Validators.maxLength(L.roomNameMax)]],
    isExterior: [false],
    notes: ['', Validators.maxLength(L.notesMax)],
  });

  ngOnInit(): void {
    const room = this.room();
    if (room) this.form.reset({ name: room.name, isExterior: room.isExterior, notes: room.notes });
  }

  protected async saveRoom(): Promise<void> {
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    const body = { name: v.name.trim(), isExterior: v.isExterior, notes: v.notes.trim() };
    this.isBusy.set(true);
    try {
      const current = this.room();
      const saved = current ? await this.api.updateRoom(current.id, body) : await this.api.addRoom(this.siteId(), body);
      this.form.reset();
      this.saved.emit(saved);
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isBusy.set(false);
    }
  }
}
