import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { TranslatePipe } from '@ngx-translate/core';
import type { SheetChange } from '@layerbook/contracts/types';
import { Language } from '../../../../../../shared/i18n/language';
import { formatDay } from './sheet-format';

/** The change orders the client approved, for the crew: what the change adds or leaves out of the work, never its price. */
@Component({
  selector: 'lb-sheet-changes',
  imports: [TranslatePipe],
  template: `
    <p class="muted">{{ 'sheet.changes.hint' | translate }}</p>
    <ol class="changes">
      @for (c of changes(); track c.number) {
        <li>
          <h3>{{ 'sheet.changes.title' | translate: { number: c.number, title: c.title } }}</h3>
          <p class="muted">{{ 'sheet.changes.approvedOn' | translate: { date: day(c.approvedOn) } }}</p>
          @if (c.description) {
            <p class="description">{{ c.description }}</p>
          }
          @if (c.finishName) {
            <p>{{ 'sheet.changes.finishOn' | translate: { finish: c.finishName } }}</p>
            <ul>
              @for (s of c.surfaces; track $index) {
                <li>{{ s.room }} · {{ s.surface }}: {{ s.quantity }}</li>
              }
            </ul>
          }
        </li>
      }
    </ol>
  `,
  styles: `
    .changes {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 0.75rem;
    }
    .changes > li {
      padding: 0.75rem 1rem;
      border-radius: 12px;
      border: 1px solid var(--mat-sys-outline-variant);
      border-left: 4px solid var(--lb-ochre);
      background: var(--mat-sys-surface-container-lowest);
    }
    h3 {
      margin: 0;
      font-size: 1.05rem;
    }
    p {
      margin: 0.35rem 0 0;
    }
    .description {
      white-space: pre-line;
    }
    ul {
      margin: 0.35rem 0 0;
      padding-left: 1.25rem;
    }
    .muted {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SheetChanges {
  private readonly language = inject(Language);
  readonly changes = input.required<readonly SheetChange[]>();

  protected day(isoDate: string): string {
    return formatDay(isoDate, this.language.locale());
  }
}
