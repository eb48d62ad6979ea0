import { ChangeDetectionStrategy, Component } from '@angular/core';
import { TranslatePipe } from '@ngx-translate/core';
import { LanguageSwitch } from '../../shared/ui/language-switch';

/** The frame around a firm's public pages: the firm's words in one card, a quiet credit below. */
@Component({
  selector: 'lb-public-frame',
  imports: [LanguageSwitch, TranslatePipe],
  template: `
    <main class="frame">
      <div class="card">
        <ng-content />
      </div>
      <p class="credit">{{ 'inquiry.page.credit' | translate }}</p>
      <lb-language-switch />
    </main>
  `,
  styles: `
    .frame {
      min-height: 100dvh;
      display: flex;
      flex-direction: column;
      align-items: center;
      padding: 2rem 0.75rem;
      box-sizing: border-box;
      background:
        linear-gradient(175deg, transparent 0 62%, rgb(63 143 127 / 8%) 62% 70%, transparent 70%),
        linear-gradient(178deg, transparent 0 74%, rgb(200 150 46 / 10%) 74% 84%, rgb(107 74 47 / 8%) 84%), var(--lb-ivory);
    }
    .card {
      width: min(100%, 40rem);
      box-sizing: border-box;
      padding: 1.75rem 1.25rem;
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
      border: 1px solid var(--mat-sys-outline-variant);
      box-shadow: 0 1px 2px rgb(74 50 32 / 10%);
    }
    .credit {
      margin: 1.25rem 0 0;
      color: var(--mat-sys-on-surface-variant);
      font-size: 0.9rem;
    }
    @media (min-width: 600px) {
      .frame {
        padding: 3rem 1rem;
      }
      .card {
        padding: 2rem 2.25rem;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PublicFrame {}
