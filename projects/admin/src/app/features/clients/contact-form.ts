import { ChangeDetectionStrategy, Component, inject, input, output } from '@angular/core';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { TranslatePipe } from '@ngx-translate/core';
import { CLIENT_LIMITS as L, EMAIL_MAX_LENGTH, PHONE_MAX_LENGTH, type ContactView } from '@layerbook/contracts/types';
import { FieldErrorPipe, type FieldErrorWords } from '../../../../../shared/forms/field-error-pipe';
import { EMAIL_ERRORS, tooLongError } from '../../shared/forms/field-words';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { Submission } from '../../shared/forms/submission';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { ClientApi } from './client-api';

/** Another person at the client: a partner, the designer's project lead, a site super. */
@Component({
  selector: 'lb-contact-form',
  imports: [FieldErrorPipe, FormAlert, MatButtonModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule, TranslatePipe],
  template: `
    <form
      [formGroup]="form"
      #formDir="ngForm"
      (ngSubmit)="addContact(formDir)"
      novalidate
      [attr.aria-label]="'clients.contactForm.form' | translate"
    >
      <fieldset class="lb-gate fields" [disabled]="!isHydrated()">
        <lb-form-alert [message]="submission.message()" />
        <mat-form-field>
          <mat-label>{{ 'clients.contactForm.name' | translate }}</mat-label>
          <input matInput formControlName="name" autocomplete="off" required />
          <mat-error>{{ form.controls.name | lbFieldError: words.name }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>{{ 'clients.contactForm.roleTitle' | translate }}</mat-label>
          <input matInput formControlName="roleTitle" autocomplete="off" />
          <mat-hint>{{ 'clients.contactForm.roleTitleHint' | translate }}</mat-hint>
          <mat-error>{{ form.controls.roleTitle | lbFieldError: words.roleTitle }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>{{ 'clients.contactForm.email' | translate }}</mat-label>
          <input matInput type="email" formControlName="email" autocomplete="off" />
          <mat-error>{{ form.controls.email | lbFieldError: words.email }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>{{ 'clients.contactForm.phone' | translate }}</mat-label>
          <input matInput type="tel" formControlName="phone" autocomplete="off" />
          <mat-error>{{ form.controls.phone | lbFieldError: words.phone }}</mat-error>
        </mat-form-field>
        <div class="lb-form-actions">
          <button mat-stroked-button type="submit" [disabled]="submission.isBusy()">{{ 'clients.contactForm.add' | translate }}</button>
        </div>
      </fieldset>
    </form>
  `,
  styles: `
    .fields {
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(14rem, 1fr));
      gap: 1rem;
      align-items: start;
    }
    lb-form-alert,
    .lb-form-actions {
      grid-column: 1 / -1;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ContactForm {
  private readonly api = inject(ClientApi);

  readonly clientId = input.required<string>();
  readonly added = output<ContactView>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [requiredText, Validators.maxLength(L.contactName)]],
    roleTitle: ['', Validators.maxLength(L.roleTitle)],
    email: ['', [Validators.email, Validators.maxLength(EMAIL_MAX_LENGTH)]],
    phone: ['', Validators.maxLength(PHONE_MAX_LENGTH)],
  });
  protected readonly isHydrated = hydratedSignal();
  protected readonly submission = new Submission();
  protected readonly words = {
    name: { required: 'clients.contactForm.errors.nameRequired', ...tooLongError(L.contactName) },
    email: EMAIL_ERRORS,
    roleTitle: tooLongError(L.roleTitle),
    phone: tooLongError(PHONE_MAX_LENGTH),
  } satisfies Record<string, FieldErrorWords>;

  protected async addContact(formDir: FormGroupDirective): Promise<void> {
    const v = this.form.getRawValue();
    const contact = await this.submission.send(this.form, () =>
      this.api.addContact(this.clientId(), {
        name: v.name.trim(),
        roleTitle: v.roleTitle.trim(),
        email: v.email.trim(),
        phone: v.phone.trim(),
      }),
    );
    if (contact) {
      // resetForm also clears "submitted", so the emptied fields do not show as errors.
      formDir.resetForm();
      this.added.emit(contact);
    }
  }
}
