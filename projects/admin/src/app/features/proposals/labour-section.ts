import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { TranslatePipe } from '@ngx-translate/core';
import type { EngineRoom } from '@layerbook/contracts/types';
import { hoursText, measureText, roundedNumber, type EstimateResultJson } from '@layerbook/domain';
import { multiplierChain } from './estimate-words';

/** Hours per surface and layer, with each multiplier that applied, then the crew's time. */
@Component({
  selector: 'lb-labour-section',
  imports: [TranslatePipe],
  template: `
    <h2 id="labour-heading">{{ 'proposals.labour.heading' | translate }}</h2>
    @for (s of surfaces(); track s.surfaceId) {
      <h3 [id]="'labour-' + s.surfaceId">{{ s.title }}</h3>
      <div class="table-wrap" tabindex="0" role="region" [attr.aria-labelledby]="'labour-' + s.surfaceId">
        <table [attr.aria-labelledby]="'labour-' + s.surfaceId">
          <thead>
            <tr>
              <th scope="col">{{ 'proposals.labour.layer' | translate }}</th>
              <th scope="col" class="num">{{ 'proposals.labour.base' | translate }}</th>
              <th scope="col">{{ 'proposals.labour.extraTime' | translate }}</th>
              <th scope="col" class="num">{{ 'proposals.labour.hours' | translate }}</th>
            </tr>
          </thead>
          <tbody>
            @for (l of s.layers; track l.layerId) {
              <tr>
                <th scope="row">{{ l.name }}</th>
                <td class="num">{{ l.base }}</td>
                <td>{{ l.chain }}</td>
                <td class="num">{{ l.hours }}</td>
              </tr>
            }
          </tbody>
        </table>
      </div>
    }
    @let t = result().labour;
    <h3 id="crew-heading">{{ 'proposals.labour.crewTime' | translate }}</h3>
    <table aria-labelledby="crew-heading">
      <tbody>
        <tr>
          <th scope="row">{{ 'proposals.labour.layers' | translate }}</th>
          <td class="num">{{ hours(t.layerHours) }}</td>
        </tr>
        <tr>
          <th scope="row">{{ 'proposals.labour.setup' | translate }}</th>
          <td class="num">{{ hours(t.setupHours) }}</td>
        </tr>
        <tr>
          <th scope="row">{{ 'proposals.labour.cleanup' | translate }}</th>
          <td class="num">{{ hours(t.cleanupHours) }}</td>
        </tr>
        <tr class="sum">
          <th scope="row">{{ 'proposals.labour.crewHours' | translate }}</th>
          <td class="num">{{ hours(t.totalCrewHours) }}</td>
        </tr>
        <tr>
          <th scope="row">{{ 'proposals.labour.crewDays' | translate }}</th>
          <td class="num">{{ days(t.crewDays) }}</td>
        </tr>
      </tbody>
    </table>
  `,
  styleUrl: './result-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LabourSection {
  readonly result = input.required<EstimateResultJson>();
  readonly rooms = input.required<readonly EngineRoom[]>();
  readonly lengthUnit = input.required<'ft' | 'm'>();

  protected readonly surfaces = computed(() => {
    const roomNames = new Map(this.rooms().map((r) => [r.id, r.name]));
    return this.result().surfaces.map((s) => ({
      surfaceId: s.surfaceId,
      title: `${roomNames.get(s.roomId) ?? ''} – ${s.name} (${measureText(s.measure, this.lengthUnit())})`,
      layers: s.layers.map((l) => ({
        layerId: l.layerId,
        name: l.name,
        base: hoursText(l.labour.baseHours),
        chain: multiplierChain(l.labour.chain),
        hours: hoursText(l.labour.hours),
      })),
    }));
  });

  protected hours(value: number): string {
    return hoursText(value);
  }

  protected days(value: number): string {
    return roundedNumber(value, 1);
  }
}
