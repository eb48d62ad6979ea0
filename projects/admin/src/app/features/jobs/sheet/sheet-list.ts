import { ChangeDetectionStrategy, Component } from '@angular/core';
import { TranslatePipe } from '@ngx-translate/core';
import { SheetJobs } from './sheet-jobs';

/** The crew's job sheets page: their jobs, each opening its sheet. */
@Component({
  selector: 'lb-sheet-list',
  imports: [SheetJobs, TranslatePipe],
  template: `
    <section class="lb-page">
      <h1>{{ 'sheet.list.title' | translate }}</h1>
      <p class="lb-lead">{{ 'sheet.list.lead' | translate }}</p>
      <lb-sheet-jobs />
    </section>
  `,
  styles: `
    h1 {
      margin: 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SheetList {}
