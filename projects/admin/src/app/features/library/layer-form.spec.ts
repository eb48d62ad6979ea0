import { FormBuilder } from '@angular/forms';
import { describe, expect, it } from 'vitest';
import { layerGroup, toLayer } from './layer-form';

const fb = new FormBuilder().nonNullable;

describe('layer form limits match the API', () => {
  it.each([
    // water as a share of the product: a 1:1 wash is 100 %, 2:1 is 200 % (common practice, no source)
    [100, 'ofConcentrate', null],
    [200, 'ofConcentrate', null],
    [1000, 'ofConcentrate', null],
    [1001, 'ofConcentrate', { ofConcentrateMax: true }],
    [99, 'ofMix', null],
    [100, 'ofMix', { ofMixMax: true }],
  ] as const)('dilution %d %% %s', (share, convention, errors) => {
    const g = layerGroup(fb);
    g.controls.dilution.setValue({ share, convention });
    expect(g.controls.dilution.controls.share.errors).toEqual(errors);
  });

  it('re-checks the dilution when its convention changes, and sends a 2:1 wash as share 2', () => {
    const g = layerGroup(fb);
    g.controls.productId.setValue('p1');
    g.controls.name.setValue('Wash');
    g.controls.dilution.controls.share.setValue(200);
    expect(g.controls.dilution.controls.share.valid).toBe(true);
    g.controls.dilution.controls.convention.setValue('ofMix');
    expect(g.controls.dilution.controls.share.errors).toEqual({ ofMixMax: true });
    g.controls.dilution.controls.convention.setValue('ofConcentrate');
    expect(toLayer(g).dilution).toEqual({ share: 2, convention: 'ofConcentrate' });
  });

  it.each([
    [100, null],
    [100.5, { max: { max: 100, actual: 100.5 } }],
  ])('waste %d %%', (waste, errors) => {
    const g = layerGroup(fb);
    g.controls.waste.setValue(waste);
    expect(g.controls.waste.errors).toEqual(errors);
  });
});
