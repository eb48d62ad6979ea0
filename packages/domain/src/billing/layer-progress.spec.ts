import { expectInputError } from '../errors/expect-input-error';
import { type LayerItem, type ValueLineWorkInput, layerCompletion, valueLineWork } from './layer-progress';

// A "layer complete" payment is due when the layer is done on every surface it covers (DOMAIN.md §2.11 triggers).
describe('layer completion', () => {
  const items: LayerItem[] = [
    { layerId: 'base', doneOn: '2027-03-02' },
    { layerId: 'base', doneOn: '2027-03-04' },
    { layerId: 'base', doneOn: '2027-03-03' },
    { layerId: 'glaze', doneOn: '2027-03-09' },
    { layerId: 'glaze', doneOn: null },
  ];
  it.each<[string, readonly LayerItem[], string, object]>([
    ['done everywhere: the last day counts', items, 'base', { total: 3, done: 3, isComplete: true, completedOn: '2027-03-04' }],
    ['one surface to go', items, 'glaze', { total: 2, done: 1, isComplete: false, completedOn: null }],
    ['a layer on no surface is never complete', items, 'wax', { total: 0, done: 0, isComplete: false, completedOn: null }],
    ['no items', [], 'base', { total: 0, done: 0, isComplete: false, completedOn: null }],
    // dates compare as days, across a year end
    [
      'across a year end',
      [
        { layerId: 'a', doneOn: '2027-01-02' },
        { layerId: 'a', doneOn: '2026-12-30' },
      ],
      'a',
      { total: 2, done: 2, isComplete: true, completedOn: '2027-01-02' },
    ],
  ])('%s', (_name, list, layerId, expected) => expect(layerCompletion(list, layerId)).toEqual(expected));

  it('names a bad date', () => {
    expectInputError(() => layerCompletion([{ layerId: 'a', doneOn: '2027-02-29' }], 'a'), 'items[0].doneOn');
  });
});

// Work this period E = work to date − previous work D; to date never below D nor above C (DOMAIN.md §2.10).
describe('work this period on a schedule-of-values line', () => {
  const line: ValueLineWorkInput = { scheduledValue: '22000.00', previousWork: '8800.00', currency: 'USD' };
  it.each<[string, Partial<ValueLineWorkInput>, string]>([
    // DOMAIN.md §2.10 worked example, Venetian plaster walls: C 22,000, D 8,800, 80 % to date → E 8,800
    ['§2.10 plaster walls at 80 %', { percentToDate: 80 }, '8800.00'],
    ['the same as an amount', { amountToDate: '17600.00' }, '8800.00'],
    // §2.10 dome: C 14,000, D 0, 50 % → E 7,000
    ['§2.10 dome at 50 %', { scheduledValue: '14000.00', previousWork: '0', percentToDate: '50' }, '7000.00'],
    // 33.333 % of 1,000.00 = 333.33; half a cent rounds up: 0.5 % of 1.00 = 0.005 → 0.01
    ['a percent that needs rounding', { scheduledValue: '1000.00', previousWork: '0', percentToDate: '33.333' }, '333.33'],
    ['half a cent rounds up', { scheduledValue: '1.00', previousWork: '0', percentToDate: '0.5' }, '0.01'],
    ['nothing this period', { percentToDate: '40' }, '0.00'],
    ['finished', { percentToDate: 100 }, '13200.00'],
  ])('%s', (_name, over, expected) => expect(valueLineWork({ ...line, ...over }).toFixed(2)).toBe(expected));

  it('billed work never shrinks, never passes the scheduled value, and one way of saying it is given', () => {
    expectInputError(() => valueLineWork({ ...line, percentToDate: 39.9 }), 'percentToDate', /never goes down/);
    expectInputError(() => valueLineWork({ ...line, amountToDate: '8799.99' }), 'amountToDate', /8799.99 is less than the 8800.00/);
    expectInputError(() => valueLineWork({ ...line, amountToDate: '22000.01' }), 'amountToDate', /more than the scheduled value 22000.00/);
    expectInputError(() => valueLineWork({ ...line, percentToDate: 100.1 }), 'percentToDate', /between 0 and 100/);
    expectInputError(() => valueLineWork({ ...line, percentToDate: 'most' }), 'percentToDate', /not a number/);
    expectInputError(() => valueLineWork(line), 'percentToDate', /one of them/);
    expectInputError(() => valueLineWork({ ...line, percentToDate: 50, amountToDate: '11000.00' }), 'amountToDate', /one of them/);
    expectInputError(() => valueLineWork({ ...line, amountToDate: '9000.001' }), 'amountToDate', /decimal places/);
    expectInputError(() => valueLineWork({ ...line, previousWork: '22000.01', percentToDate: 100 }), 'previousWork');
  });
});
