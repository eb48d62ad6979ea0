import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { SayPipe } from '../errors/say-pipe';

/** The form-level message: what the server said when it named no single field (our own fallbacks and words keys translated). */
@Component({
  selector: 'lb-form-alert',
  imports: [MatIconModule, SayPipe],
  template: `
    @if (message(); as text) {
      <p class="lb-form-alert" role="alert">
        <mat-icon aria-hidden="true">error</mat-icon>
        <span>{{ text | lbSay }}</span>
      </p>
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FormAlert {
  readonly message = input<string | null>(null);
}
