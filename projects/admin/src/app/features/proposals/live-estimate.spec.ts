import { describe, expect, it } from 'vitest';
import type { EstimateContext, EstimateInputs } from '@layerbook/contracts/types';
import { computeLive } from './live-estimate';

const context = { rooms: [], finishSystems: [], products: [] } as unknown as EstimateContext;
const inputs = (surfaces: EstimateInputs['variants'][number]['surfaces']): EstimateInputs => ({
  title: 'T',
  startDate: '2026-12-03',
  isOccupied: false,
  variants: [{ id: 'A', label: 'Option A', surfaces }],
  addOns: [],
  equipment: [],
  subcontracts: [],
  sundries: [],
  discount: null,
  perAreaRates: {},
});

describe('computeLive', () => {
  it.each([
    ['an option that is not there', 'B', inputs([]), 'Choose an option.'],
    ['an option with no finish yet', 'A', inputs([]), 'Choose a finish for at least one surface to see numbers.'],
  ])('waits for %s', (_what, variantId, given, message) => {
    expect(computeLive(context, given, variantId)).toEqual({ kind: 'waiting', variantId, message });
  });
});
