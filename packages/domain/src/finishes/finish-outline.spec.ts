import type { FinishLayer } from './finish-system';
import { finishProductIds, layerProductIds, outlineFinish, totalWaitHours } from './finish-outline';

type Layer = Pick<FinishLayer, 'productId' | 'recipe' | 'waitHoursAfter'>;
const single = (productId: string, waitHoursAfter: number): Layer => ({ productId, waitHoursAfter });
const mix = (base: string, others: string[], waitHoursAfter: number): Layer => ({
  recipe: { by: 'volume', baseProductId: base, components: [base, ...others].map((productId) => ({ productId, parts: 1 })) },
  waitHoursAfter,
});

// A finish system as the library sums it up (common practice, no source).
describe('finish outline', () => {
  it.each([
    ['a single product', single('primer', 4), ['primer']],
    ['a mix, base first, each product once', mix('medium', ['tint'], 24), ['medium', 'tint']],
    ['a layer naming nothing yet', { waitHoursAfter: 0 }, []],
  ])('layerProductIds: %s', (_what, layer, ids) => expect(layerProductIds(layer)).toEqual(ids));

  const stack = [single('primer', 4), mix('lime', ['marble'], 72), mix('medium', ['tint', 'lime'], 24)];

  it('lists each product once, in the order the layers first use it', () => {
    expect(finishProductIds(stack)).toEqual(['primer', 'lime', 'marble', 'medium', 'tint']);
  });

  it.each([
    [[], 0],
    [[{ waitHoursAfter: 4 }], 4],
    [stack, 100], // the last layer's wait counts: it is the cure before use
  ])('totalWaitHours(%j) is %d', (layers, hours) => expect(totalWaitHours(layers)).toBe(hours));

  it('outlines a system in one call', () => {
    expect(outlineFinish(stack)).toEqual({
      layerCount: 3,
      totalWaitHours: 100,
      productIds: ['primer', 'lime', 'marble', 'medium', 'tint'],
    });
  });
});
