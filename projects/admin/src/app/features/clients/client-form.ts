import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { TranslatePipe } from '@ngx-translate/core';
import {
  CLIENT_KINDS,
  CLIENT_KIND_LABELS,
  CLIENT_LIMITS as L,
  EMAIL_MAX_LENGTH,
  LANGUAGES,
  PHONE_MAX_LENGTH,
  type ClientCreate,
  type ClientDetail,
  type ClientKind,
  type Language,
  type ClientSummary,
} from '@layerbook/contracts/types';
import { FieldErrorPipe, type FieldErrorWords } from '../../../../../shared/forms/field-error-pipe';
import { EMAIL_ERRORS, tooLongError } from '../../shared/forms/field-words';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { ClientApi } from './client-api';

/** Adds a client, or edits one when given it. */
@Component({
  selector: 'lb-client-form',
  imports: [
    FieldErrorPipe,
    FormAlert,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
    TranslatePipe,
  ],
  template: `
    <form
      [formGroup]="form"
      (ngSubmit)="saveClient()"
      novalidate
      [attr.aria-label]="(isNew() ? 'clients.clientForm.newClient' : 'clients.clientForm.editClient') | translate"
    >
      <fieldset class="lb-gate fields" [disabled]="!isHydrated()">
        <lb-form-alert [message]="submission.message()" />
        <mat-form-field class="wide">
          <mat-label>{{ 'clients.clientForm.clientName' | translate }}</mat-label>
          <input matInput formControlName="name" autocomplete="off" required />
          <mat-hint>{{ 'clients.clientForm.clientNameHint' | translate }}</mat-hint>
          <mat-error>{{ form.controls.name | lbFieldError: words.name }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>{{ 'clients.clientForm.kindOfClient' | translate }}</mat-label>
          <mat-select formControlName="kind" required>
            @for (kind of kinds; track kind) {
              <mat-option [value]="kind">{{ kindLabels[kind] }}</mat-option>
            }
          </mat-select>
          <mat-error>{{ form.controls.kind | lbFieldError: words.kind }}</mat-error>
        </mat-form-field>
        <mat-checkbox formControlName="isCompany">{{ 'clients.clientForm.isCompany' | translate }}</mat-checkbox>
        <mat-form-field>
          <mat-label>{{ 'clients.clientForm.email' | translate }}</mat-label>
          <input matInput type="email" formControlName="email" autocomplete="off" />
          <mat-error>{{ form.controls.email | lbFieldError: words.email }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>{{ 'clients.clientForm.phone' | translate }}</mat-label>
          <input matInput type="tel" formControlName="phone" autocomplete="off" />
          <mat-error>{{ form.controls.phone | lbFieldError: words.phone }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>{{ 'clients.clientForm.language' | translate }}</mat-label>
          <mat-select formControlName="language">
            <mat-option [value]="null">{{ 'clients.clientForm.firmLanguage' | translate }}</mat-option>
            @for (language of languages; track language) {
              <mat-option [value]="language">{{ 'common.languageNames.' + language | translate }}</mat-option>
            }
          </mat-select>
          <mat-hint>{{ 'clients.clientForm.languageHint' | translate }}</mat-hint>
          <mat-error>{{ form.controls.language | lbFieldError: {} }}</mat-error>
        </mat-form-field>
        <mat-form-field class="wide">
          <mat-label>{{ 'clients.clientForm.notes' | translate }}</mat-label>
          <textarea matInput formControlName="notes" rows="3"></textarea>
          <mat-hint>{{ 'clients.clientForm.notesHint' | translate }}</mat-hint>
          <mat-error>{{ form.controls.notes | lbFieldError: words.notes }}</mat-error>
        </mat-form-field>
        <div class="lb-form-actions wide">
          <button mat-flat-button type="submit" [disabled]="submission.isBusy()">
            {{ (isNew() ? 'clients.clientForm.addClient' : 'clients.clientForm.saveClient') | translate }}
          </button>
          <button mat-button type="button" (click)="cancelled.emit()">{{ 'clients.cancel' | translate }}</button>
        </div>
      </fieldset>
    </form>
  `,
  styles: `
    .fields {
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(15rem, 1fr));
      gap: 1rem;
      align-items: center;
    }
    .wide,
    lb-form-alert {
      grid-column: 1 / -1;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClientForm implements OnInit {
  private readonly api = inject(ClientApi);
  private readonly fb = inject(NonNullableFormBuilder);

  readonly client = input<ClientDetail | null>(null);
  readonly saved = output<ClientSummary>();
  readonly cancelled = output<void>();

  protected readonly isNew = computed(() => this.client() === null);
  protected readonly kinds = CLIENT_KINDS;
  protected readonly kindLabels = CLIENT_KIND_LABELS;
  protected readonly languages = LANGUAGES;
  protected readonly isHydrated = hydratedSignal();
  protected readonly submission = new Submission();
  protected readonly words = {
    name: { required: 'clients.clientForm.errors.nameRequired', ...tooLongError(L.name) },
    kind: { required: 'clients.clientForm.errors.kindRequired' },
    email: EMAIL_ERRORS,
    phone: tooLongError(PHONE_MAX_LENGTH),
    notes: tooLongError(L.notes),
  } satisfies Record<string, FieldErrorWords>;

  protected readonly form = this.fb.group({
    name: ['', [requiredText, Validators.maxLength(L.name)]],
    kind: this.fb.control<ClientKind>('homeowner', Validators.required),
    isCompany: [false],
    email: ['', [Validators.email, Validators.maxLength(EMAIL_MAX_LENGTH)]],
    phone: ['', Validators.maxLength(PHONE_MAX_LENGTH)],
    notes: ['', Validators.maxLength(L.notes)],
    /** null = the firm's language */
    language: this.fb.control<Language | null>(null),
  });

  ngOnInit(): void {
    const client = this.client();
    if (client) {
      const { name, kind, isCompany, email, phone, notes, language } = client;
      this.form.reset({ name, kind, isCompany, email, phone, notes, language });
    }
  }

  protected async saveClient(): Promise<void> {
    const current = this.client();
    const saved = await this.submission.send(this.form, () =>
      current ? this.api.update(current.id, this.toBody()) : this.api.create(this.toBody()),
    );
    if (saved) {
      this.saved.emit(saved);
    }
  }

  private toBody(): ClientCreate {
    const v = this.form.getRawValue();
    return {
      kind: v.kind,
      isCompany: v.isCompany,
      name: v.name.trim(),
      email: v.email.trim(),
      phone: v.phone.trim(),
      notes: v.notes.trim(),
      language: v.language,
    };
  }
}
