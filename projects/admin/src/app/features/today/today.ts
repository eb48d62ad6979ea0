import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ComingSoon } from '../../shared/ui/coming-soon';

@Component({
  selector: 'lb-today',
  imports: [ComingSoon],
  template: `<lb-coming-soon heading="Today" summary="What needs you today: inquiries to answer, follow-ups that are due, site visits, jobs on the wall and invoices falling due." />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Today {}
