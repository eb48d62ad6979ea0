import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { TranslatePipe } from '@ngx-translate/core';
import { Wordmark } from './wordmark';

/** The quiet frame around every signed-out page: mark, heading, one card. */
@Component({
  selector: 'lb-auth-frame',
  imports: [TranslatePipe, Wordmark],
  template: `
    <main class="frame">
      <div class="card">
        <lb-wordmark />
        <h1>{{ heading() | translate }}</h1>
        <ng-content />
      </div>
    </main>
  `,
  styles: `
    .frame {
      min-height: 100dvh;
      display: grid;
      place-items: start center;
      padding: 3rem 1rem;
      box-sizing: border-box;
      background:
        linear-gradient(175deg, transparent 0 62%, rgb(63 143 127 / 8%) 62% 70%, transparent 70%),
        linear-gradient(178deg, transparent 0 74%, rgb(200 150 46 / 10%) 74% 84%, rgb(107 74 47 / 8%) 84%), var(--lb-ivory);
    }
    .card {
      box-sizing: border-box;
      width: min(100%, 26rem);
      padding: 2rem 1.75rem;
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
      border: 1px solid var(--mat-sys-outline-variant);
      box-shadow: 0 1px 2px rgb(74 50 32 / 10%);
    }
    h1 {
      margin-top: 1.5rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AuthFrame {
  /** a words key (or text shown as is) */
  readonly heading = input.required<string>();
}
