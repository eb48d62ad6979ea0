import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { EngineRoom } from '@layerbook/contracts/types';
import { hoursText, measureText, roundedNumber, type EstimateResultJson } from '@layerbook/domain';
import { multiplierChain } from './estimate-words';

/** Hours per surface and layer, with each multiplier that applied, then the crew's time. */
@Component({
  selector: 'lb-labour-section',
  template: `
    <h2 id="labour-heading">Labour</h2>
    @for (s of surfaces(); track s.surfaceId) {
      <h3 [id]="'labour-' + s.surfaceId">{{ s.title }}</h3>
      <div class="table-wrap" tabindex="0" role="region" [attr.aria-labelledby]="'labour-' + s.surfaceId">
        <table [attr.aria-labelledby]="'labour-' + s.surfaceId">
          <thead>
            <tr>
              <th scope="col">Layer</th>
              <th scope="col" class="num">Base</th>
              <th scope="col">Extra time for</th>
              <th scope="col" class="num">Hours</th>
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
    <h3 id="crew-heading">Crew time</h3>
    <table aria-labelledby="crew-heading">
      <tbody>
        <tr>
          <th scope="row">Layers</th>
          <td class="num">{{ hours(t.layerHours) }}</td>
        </tr>
        <tr>
          <th scope="row">Setup, masking and protection</th>
          <td class="num">{{ hours(t.setupHours) }}</td>
        </tr>
        <tr>
          <th scope="row">Demasking and clean-up</th>
          <td class="num">{{ hours(t.cleanupHours) }}</td>
        </tr>
        <tr class="sum">
          <th scope="row">Crew-hours</th>
          <td class="num">{{ hours(t.totalCrewHours) }}</td>
        </tr>
        <tr>
          <th scope="row">Crew-days</th>
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
