import { ChangeDetectionStrategy, Component, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { TranslatePipe } from '@ngx-translate/core';

/** Show/hide toggle for a password input; sits in the field as `matSuffix`. */
@Component({
  selector: 'lb-reveal-password',
  imports: [TranslatePipe, MatButtonModule, MatIconModule],
  template: `
    <button
      mat-icon-button
      type="button"
      [attr.aria-label]="'ui.revealPassword.show' | translate"
      [attr.aria-pressed]="isShown()"
      (click)="toggle()"
    >
      <mat-icon aria-hidden="true">{{ isShown() ? 'visibility_off' : 'visibility' }}</mat-icon>
    </button>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RevealPassword {
  readonly input = input.required<HTMLInputElement>();
  protected readonly isShown = signal(false);

  protected toggle(): void {
    this.isShown.update((shown) => !shown);
    this.input().type = this.isShown() ? 'text' : 'password';
  }
}
