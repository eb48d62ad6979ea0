import { describe, expect, it } from 'vitest';
import type { EstimateInput } from '@layerbook/domain';
import { engineTarget, targetKey } from './field-targets';

const input = {
  rooms: [{ id: 'r1', name: 'Dining room', surfaces: [{ id: 's1' }, { id: 's2' }] }],
  finishSystems: [{ id: 'f1', name: 'Limewash' }],
  products: [{ id: 'p1', name: 'Lime putty' }],
} as unknown as EstimateInput;

describe('engineTarget', () => {
  it.each([
    ['rooms[0].surfaces[1].shape.rise', { kind: 'surface', surfaceId: 's2' }],
    // the server's problem+json names the same path with dots
    ['rooms.0.surfaces.1.shape.rise', { kind: 'surface', surfaceId: 's2' }],
    ['pricing.direct.sundries.3.amount', { kind: 'control', path: 'sundries.3.amount' }],
    ['finishSystems[0].layers[2].coverage', { kind: 'top', prefix: 'Finish system “Limewash” in the library: ' }],
    ['products[0].containers', { kind: 'top', prefix: 'Product “Lime putty” in the library: ' }],
    ['options[2].materialsCost', { kind: 'control', path: 'addOns.2.materialsCost' }],
    ['options[1]', { kind: 'control', path: 'addOns.1.label' }],
    ['pricing.discount.share', { kind: 'control', path: 'discount.percent' }],
    ['pricing.direct.sundries[3].amount', { kind: 'control', path: 'sundries.3.amount' }],
    ['startDate', { kind: 'control', path: 'startDate' }],
    ['settings.calendar.workingWeekdays', { kind: 'top', prefix: 'The firm’s estimating settings: ' }],
    ['somethingElse', { kind: 'top', prefix: '' }],
  ])('%s → %j', (field, target) => expect(engineTarget(field, input)).toEqual(target));

  it.each([
    [{ kind: 'surface' as const, surfaceId: 's1' }, 'surface:s1'],
    [{ kind: 'control' as const, path: 'discount.amount' }, 'discount.amount'],
    [{ kind: 'top' as const, prefix: 'x' }, 'top'],
  ])('targetKey(%j) is %s', (target, key) => expect(targetKey(target)).toBe(key));
});
