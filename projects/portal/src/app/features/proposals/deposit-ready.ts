import { TranslatePipe } from '@ngx-translate/core';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

/** Right after accepting, when the firm issued the deposit invoice in the same step: the way to pay it now. */
@Component({
  selector: 'lb-deposit-ready',
  imports: [MatButtonModule, MatIconModule, RouterLink, TranslatePipe],
  template: `
    <section class="deposit" aria-labelledby="deposit-heading">
      <h2 id="deposit-heading">{{ 'proposals.deposit.heading' | translate }}</h2>
      <p>{{ 'proposals.deposit.text' | translate: { firm: firmName() } }}</p>
      <a mat-flat-button [routerLink]="['/invoices', invoiceId()]">
        <mat-icon aria-hidden="true">credit_card</mat-icon>
        {{ 'proposals.deposit.pay' | translate }}
      </a>
    </section>
  `,
  styles: `
    .deposit {
      margin: 1rem 0 0;
      padding: 1rem 1.25rem;
      border-radius: 12px;
      border: 1px solid var(--mat-sys-outline-variant);
      background: var(--mat-sys-surface-container-low);
    }
    h2 {
      font-family: var(--lb-serif);
      font-size: 1.15rem;
      margin: 0 0 0.5rem;
    }
    p {
      margin: 0 0 0.75rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DepositReady {
  readonly invoiceId = input.required<string>();
  readonly firmName = input.required<string>();
}
