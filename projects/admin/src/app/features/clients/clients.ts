import { ChangeDetectionStrategy, Component } from '@angular/core';
import { ComingSoon } from '../../shared/ui/coming-soon';

@Component({
  selector: 'lb-clients',
  imports: [ComingSoon],
  template: `<lb-coming-soon heading="Clients" summary="Homeowners, designers and general contractors you work for, with their contacts, addresses and past jobs." />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Clients {}
