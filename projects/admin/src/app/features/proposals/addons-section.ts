import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import type { EstimateResultJson } from '@layerbook/domain';

/** Alternates the client may add, each priced on its own (no minimum charge). */
@Component({
  selector: 'lb-addons-section',
  imports: [MoneyPipe],
  template: `
    <h2 id="addons-heading">Add-ons</h2>
    @if (result().options.length > 0) {
      <div class="table-wrap" tabindex="0" role="region" aria-labelledby="addons-heading">
        <table aria-labelledby="addons-heading">
          <thead>
            <tr>
              <th scope="col">Add-on</th>
              <th scope="col" class="num">Price</th>
              <th scope="col" class="num">Tax</th>
              <th scope="col" class="num">Total</th>
            </tr>
          </thead>
          <tbody>
            @for (o of result().options; track o.id) {
              <tr>
                <th scope="row">{{ o.label }}</th>
                <td class="num">{{ o.price.price | money: currency() }}</td>
                <td class="num">{{ o.price.tax | money: currency() }}</td>
                <td class="num">{{ o.price.total | money: currency() }}</td>
              </tr>
            }
          </tbody>
        </table>
      </div>
      <p class="hint">Priced separately, not in the price above.</p>
    } @else {
      <p class="hint">No add-ons. Add one under Extras to price it separately.</p>
    }
  `,
  styleUrl: './result-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AddOnsSection {
  readonly result = input.required<EstimateResultJson>();
  readonly currency = input.required<string>();
}
