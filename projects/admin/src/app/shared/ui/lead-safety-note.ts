import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { TranslatePipe } from '@ngx-translate/core';

/** Year 1978 is when the US banned lead paint for homes; older buildings fall under the RRP rule. */
const LEAD_BAN_YEAR = 1978;

/** The lead-safe hint for older buildings, or a plain "not known" when nobody has said. */
@Component({
  selector: 'lb-lead-safety-note',
  imports: [TranslatePipe, MatIconModule],
  template: `
    @if (yearBuilt() === null) {
      <p class="unknown">
        <mat-icon aria-hidden="true">help</mat-icon>
        <span>{{ 'ui.leadSafety.yearUnknown' | translate }}</span>
      </p>
    } @else if (isPre1978()) {
      <p class="lb-notice" role="note">
        <mat-icon aria-hidden="true">warning</mat-icon>
        <span>{{ 'ui.leadSafety.pre1978' | translate: { year: 1978 } }}</span>
      </p>
    }
  `,
  styles: `
    .unknown {
      display: flex;
      align-items: center;
      gap: 0.5rem;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LeadSafetyNote {
  readonly yearBuilt = input<number | null>(null);
  protected readonly isPre1978 = computed(() => {
    const year = this.yearBuilt();
    return year !== null && year < LEAD_BAN_YEAR;
  });
}
