import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ComingSoon } from '../../shared/ui/coming-soon';

@Component({
  selector: 'lb-cash',
  imports: [ComingSoon],
  template: `<lb-coming-soon
    heading="Cash"
    summary="Money owed by age, cash received by month and cash expected by week, with exports for your accountant."
  />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Cash {}
