import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ComingSoon } from '../../shared/ui/coming-soon';

@Component({
  selector: 'lb-jobs',
  imports: [ComingSoon],
  template: `<lb-coming-soon heading="Jobs &amp; proposals" summary="Measured rooms and surfaces, finish systems, sample boards, priced proposals and the jobs they turn into." />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Jobs {}
