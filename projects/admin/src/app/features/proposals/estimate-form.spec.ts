import { describe, expect, it } from 'vitest';
import type { EstimateContext, EstimateInputs } from '@layerbook/contracts/types';
import { estimateForm, fillForm, nextAddOnId, nextOptionId, readInputs } from './estimate-form';

const context = {
  rooms: [
    {
      id: 'r1',
      name: 'Dining room',
      isExterior: false,
      surfaces: [
        { id: 's1', name: 'Walls', shape: { kind: 'ceilingRect', length: 1, width: 1 }, disturbedPaintedArea: null },
        { id: 's2', name: 'Ceiling', shape: { kind: 'ceilingRect', length: 1, width: 1 }, disturbedPaintedArea: null },
      ],
    },
  ],
  finishSystems: [{ id: 'f1', name: 'Limewash', layers: [] }],
} as unknown as EstimateContext;

const inputs: EstimateInputs = {
  title: 'Dining room',
  startDate: '2026-12-03',
  isOccupied: true,
  variants: [{ id: 'A', label: 'Option A', surfaces: [{ surfaceId: 's2', finishSystemId: 'f1' }] }],
  addOns: [{ id: 'addon-1', label: 'Stencil', labourHours: 6.5, materialsCost: '40.00' }],
  equipment: [],
  subcontracts: [{ label: 'Electrician', amount: '250.00' }],
  sundries: [],
  discount: { kind: 'percent', percent: 5 },
  perAreaRates: { f1: '2.50' },
  internalNotes: 'Price the scaffold rental from the yard on Mill Road.',
  clientNotes: 'We cover the floors and furniture every day.',
};

describe('estimate form', () => {
  it('keeps internal notes and notes for the client in their own fields', () => {
    const form = estimateForm();
    fillForm(form, context, inputs);
    const read = readInputs(form, context);
    expect(read.internalNotes).toBe('Price the scaffold rental from the yard on Mill Road.');
    expect(read.clientNotes).toBe('We cover the floors and furniture every day.');
    fillForm(form, context, { ...inputs, internalNotes: undefined, clientNotes: undefined });
    expect(readInputs(form, context)).toMatchObject({ internalNotes: '', clientNotes: '' });
  });

  it('gives back exactly the inputs it was filled with', () => {
    const form = estimateForm();
    fillForm(form, context, inputs);
    expect(readInputs(form, context)).toEqual(inputs);
  });

  it("lists a variant's surfaces in takeoff order and leaves out surfaces with no finish", () => {
    const form = estimateForm();
    fillForm(form, context, {
      ...inputs,
      variants: [
        {
          id: 'A',
          label: 'A',
          surfaces: [
            { surfaceId: 's2', finishSystemId: 'f1' },
            { surfaceId: 's1', finishSystemId: 'f1' },
          ],
        },
      ],
    });
    expect(readInputs(form, context).variants[0]?.surfaces.map((s) => s.surfaceId)).toEqual(['s1', 's2']);
  });

  it.each([
    [[], 'A'],
    [['A', 'B'], 'C'],
    [['B'], 'A'],
  ])('nextOptionId(%j) is %s', (used, id) => expect(nextOptionId(used)).toBe(id));

  it.each([
    [[], 'addon-1'],
    [['addon-1', 'addon-2'], 'addon-3'],
    [['addon-2'], 'addon-3'],
  ])('nextAddOnId(%j) is %s', (used, id) => expect(nextAddOnId(used)).toBe(id));
});
