import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { TranslatePipe } from '@ngx-translate/core';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import type { EstimateResultJson } from '@layerbook/domain';

/** Alternates the client may add, each priced on its own (no minimum charge). */
@Component({
  selector: 'lb-addons-section',
  imports: [MoneyPipe, TranslatePipe],
  template: `
    <h2 id="addons-heading">{{ 'proposals.addons.heading' | translate }}</h2>
    @if (result().options.length > 0) {
      <div class="table-wrap" tabindex="0" role="region" aria-labelledby="addons-heading">
        <table aria-labelledby="addons-heading">
          <thead>
            <tr>
              <th scope="col">{{ 'proposals.addons.addOn' | translate }}</th>
              <th scope="col" class="num">{{ 'proposals.addons.price' | translate }}</th>
              <th scope="col" class="num">{{ 'proposals.addons.tax' | translate }}</th>
              <th scope="col" class="num">{{ 'proposals.addons.total' | translate }}</th>
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
      <p class="hint">{{ 'proposals.addons.separate' | translate }}</p>
    } @else {
      <p class="hint">{{ 'proposals.addons.none' | translate }}</p>
    }
  `,
  styleUrl: './result-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AddOnsSection {
  readonly result = input.required<EstimateResultJson>();
  readonly currency = input.required<string>();
}
