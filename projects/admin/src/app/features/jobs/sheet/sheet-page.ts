import { ChangeDetectionStrategy, Component } from '@angular/core';

/** One job's sheet (placeholder until the sheet UI lands). */
@Component({
  selector: 'lb-sheet-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: ``,
})
export class SheetPage {}
