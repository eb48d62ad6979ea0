import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ComingSoon } from '../../shared/ui/coming-soon';

@Component({
  selector: 'lb-billing',
  imports: [ComingSoon],
  template: `<lb-coming-soon
    heading="Billing"
    summary="Payment schedules, deposit, progress and final invoices, change orders and retainage, and payments received."
  />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Billing {}
