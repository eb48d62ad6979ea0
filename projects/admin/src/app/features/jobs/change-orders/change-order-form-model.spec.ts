import type { ChangeOrderView, TakeoffView } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import {
  applyPricingKind,
  changeOrderForm,
  fillChangeOrder,
  placeSurfaceProblems,
  readChangeOrder,
  surfaceGroups,
  toSignedAmount,
} from './change-order-form-model';

function draft(over: Partial<ChangeOrderView>): ChangeOrderView {
  return {
    id: 'co1',
    jobId: 'j1',
    number: 1,
    title: 'Venetian niche',
    status: 'draft',
    currency: 'USD',
    price: '1000.00',
    tax: '82.50',
    amount: '1082.50',
    sentAt: null,
    decidedAt: null,
    description: 'By the stair',
    pricingKind: 'lumpSum',
    pricing: { kind: 'lumpSum', price: '1000.00' },
    engine: null,
    signedName: null,
    clientComment: '',
    contractSumBefore: '10000.00',
    contractSumAfter: '11082.50',
    jobTitle: 'Dining room plaster',
    taxNote: null,
    ...over,
  };
}

describe('change order form', () => {
  it.each([
    ['1,250.00', '1250.00', null],
    [' -250 ', '-250', null],
    ['−75.5', '-75.5', null],
    ['0.00', '0.00', 'zero'],
    ['-0', '-0', 'zero'],
    ['12.345', '12.345', 'amount'],
    ['ten', 'ten', 'amount'],
  ])('reads the price %j as %j (error: %s), as the API checks it', (typed, amount, error) => {
    expect(toSignedAmount(typed)).toBe(amount);
    const form = changeOrderForm();
    form.controls.pricing.controls.price.setValue(typed);
    const errors = form.controls.pricing.controls.price.errors;
    expect(errors ? Object.keys(errors) : []).toEqual(error ? [error] : []);
  });

  it('checks only the chosen way of pricing, and sends only it', () => {
    const form = changeOrderForm();
    form.setValue({
      title: ' Extra niche ',
      description: '',
      pricing: { kind: 'lumpSum', price: '-250', surfaceIds: [], finishSystemId: '' },
    });
    expect(form.valid).toBe(true);
    expect(readChangeOrder(form)).toEqual({ title: 'Extra niche', description: '', pricing: { kind: 'lumpSum', price: '-250' } });

    form.controls.pricing.controls.kind.setValue('engine');
    applyPricingKind(form);
    expect(form.valid).toBe(false);
    expect(form.controls.pricing.controls.surfaceIds.hasError('required')).toBe(true);
    expect(form.controls.pricing.controls.finishSystemId.hasError('required')).toBe(true);
    form.controls.pricing.patchValue({ surfaceIds: ['s1', 's2'], finishSystemId: 'f1' });
    expect(form.valid).toBe(true);
    expect(readChangeOrder(form).pricing).toEqual({ kind: 'engine', surfaceIds: ['s1', 's2'], finishSystemId: 'f1' });
  });

  it('fills a saved draft back in, engine-priced or lump sum', () => {
    const form = changeOrderForm();
    fillChangeOrder(form, draft({ pricingKind: 'engine', pricing: { kind: 'engine', surfaceIds: ['s1'], finishSystemId: 'f1' } }));
    expect(form.controls.pricing.controls.price.disabled).toBe(true);
    expect(readChangeOrder(form)).toEqual({
      title: 'Venetian niche',
      description: 'By the stair',
      pricing: { kind: 'engine', surfaceIds: ['s1'], finishSystemId: 'f1' },
    });
    fillChangeOrder(form, draft({}));
    expect(form.controls.pricing.controls.surfaceIds.disabled).toBe(true);
    expect(readChangeOrder(form).pricing).toEqual({ kind: 'lumpSum', price: '1000.00' });
  });

  it('puts the server’s surface problems on the one surfaces field', () => {
    const placed = placeSurfaceProblems({
      type: 'about:blank',
      title: 'Bad request',
      status: 400,
      errors: [
        { field: 'pricing.surfaceIds.3', message: "Choose one of this site's measured surfaces." },
        { field: 'title', message: 'Give the change order a title.' },
      ],
    });
    expect(placed.errors?.map((e) => e.field)).toEqual(['pricing.surfaceIds', 'title']);
  });

  it('groups the site’s surfaces by room, leaving out rooms with none', () => {
    const room = (name: string, surfaces: string[]) => ({ name, surfaces: surfaces.map((s) => ({ id: `${name}-${s}`, name: s })) });
    const takeoff = { rooms: [room('Dining room', ['Walls', 'Ceiling']), room('Porch', [])] } as unknown as Pick<TakeoffView, 'rooms'>;
    expect(surfaceGroups(takeoff)).toEqual([
      {
        room: 'Dining room',
        surfaces: [
          { id: 'Dining room-Walls', name: 'Walls' },
          { id: 'Dining room-Ceiling', name: 'Ceiling' },
        ],
      },
    ]);
  });
});
