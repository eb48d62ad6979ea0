import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

/** The form-level message: what the server said when it named no single field. */
@Component({
  selector: 'lb-form-alert',
  imports: [MatIconModule],
  template: `
    @if (message(); as text) {
      <p class="lb-form-alert" role="alert">
        <mat-icon aria-hidden="true">error</mat-icon>
        <span>{{ text }}</span>
      </p>
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FormAlert {
  readonly message = input<string | null>(null);
}
