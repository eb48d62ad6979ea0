import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

/** Year 1978 is when the US banned lead paint for homes; older buildings fall under the RRP rule. */
const LEAD_BAN_YEAR = 1978;

/** The lead-safe hint for older buildings, or a plain "not known" when nobody has said. */
@Component({
  selector: 'lb-lead-safety-note',
  imports: [MatIconModule],
  template: `
    @if (yearBuilt() === null) {
      <p class="unknown">
        <mat-icon aria-hidden="true">help</mat-icon>
        <span>Year built not known.</span>
      </p>
    } @else if (isPre1978()) {
      <p class="lb-notice" role="note">
        <mat-icon aria-hidden="true">warning</mat-icon>
        <span>
          Built before 1978: lead-safe work rules (EPA RRP, 40 CFR 745) may apply if painted surfaces are disturbed. Follow local codes and
          licensed practice.
        </span>
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
