import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ComingSoon } from '../../shared/ui/coming-soon';

@Component({
  selector: 'lb-inquiries',
  imports: [ComingSoon],
  template: `<lb-coming-soon heading="Inquiries" summary="Every lead from first call to won or lost, with its stage, estimated value, likelihood and next follow-up date." />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Inquiries {}
