import { ChangeDetectionStrategy, Component } from '@angular/core';

/** The crew's jobs (placeholder until the sheet UI lands). */
@Component({
  selector: 'lb-sheet-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: ``,
})
export class SheetList {}
