import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import type { ChartOptions } from 'chart.js';
import { BaseChartDirective } from 'ng2-charts';
import type { BarData } from './cash-charts';

/**
 * A bar chart with its figures beside it. The canvas is one picture to assistive technology (its
 * summary says what it shows); the table projected beside it carries every number, and all the
 * keyboard-usable parts (drill-down buttons, links) are in that table.
 */
@Component({
  selector: 'lb-cash-chart',
  imports: [BaseChartDirective],
  host: { class: 'lb-cash-chart' },
  template: `
    <div class="canvas-box">
      <canvas
        baseChart
        type="bar"
        [data]="data()"
        [options]="options()"
        role="img"
        [attr.aria-label]="summary()"
        (chartClick)="chooseBar($event.active)"
      ></canvas>
    </div>
    <!-- a wide table scrolls sideways on a phone: the box takes focus so a keyboard can scroll it -->
    <div class="figures" tabindex="0" role="region" [attr.aria-label]="'Figures: ' + summary()">
      <ng-content />
    </div>
  `,
  styles: `
    :host {
      display: grid;
      grid-template-columns: minmax(0, 3fr) minmax(0, 2fr);
      gap: 1rem 1.5rem;
      align-items: start;
    }
    @media (max-width: 900px) {
      :host {
        grid-template-columns: minmax(0, 1fr);
      }
    }
    .canvas-box {
      position: relative;
      height: 18rem;
    }
    .figures {
      overflow-x: auto;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CashChart {
  readonly data = input.required<BarData>();
  readonly options = input.required<ChartOptions<'bar'>>();
  /** what the chart shows, in one sentence, for screen readers */
  readonly summary = input.required<string>();
  /** the index of a bar clicked with the mouse; the table beside offers the same choice by keyboard */
  readonly barChosen = output<number>();

  protected chooseBar(active: readonly object[] | undefined): void {
    const first: unknown = active?.[0];
    if (first && typeof first === 'object' && 'index' in first && typeof first.index === 'number') this.barChosen.emit(first.index);
  }
}
