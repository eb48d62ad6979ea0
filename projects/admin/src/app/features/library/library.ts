import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ComingSoon } from '../../shared/ui/coming-soon';

@Component({
  selector: 'lb-library',
  imports: [ComingSoon],
  template: `<lb-coming-soon heading="Finish library" summary="Your finish systems: each layer in order with its product, coverage, coats, production rate and dry time." />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Library {}
