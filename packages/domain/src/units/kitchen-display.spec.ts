import { toBase } from './quantity-unit';
import { formatKitchenVolume } from './kitchen-display';

describe('kitchen display of volumes', () => {
  it.each([
    // DOMAIN.md §2.4 [D]; unit relations NIST Handbook 44 App. C
    [toBase(12, 'tbsp'), '¾ cup', '177.4 mL'],
    [toBase(18, 'floz'), '2¼ cups', '532.3 mL'],
    [toBase(2, 'tbsp'), '2 tbsp', '29.6 mL'],
    [toBase(1, 'cup') / 3, '⅓ cup', '78.9 mL'],
    [toBase(1.5, 'gallon'), '1½ gal', '5.68 L'],
    [toBase(3, 'quart'), '3 qt', '2.84 L'],
    [toBase(0.5, 'tsp'), '½ tsp', '2.46 mL'],
  ])('%d mL shows as %s (%s)', (ml, text, metric) => {
    const shown = formatKitchenVolume(ml);
    expect(shown.text).toBe(text);
    expect(shown.metric).toBe(metric);
    expect(shown.isApproximate).toBe(false);
  });

  it('marks a rounded fraction as approximate and keeps the exact amount', () => {
    // DOMAIN.md §2.3 [D]: paint share of the dome glaze, 5.675 fl oz ≈ 11.35 tbsp ≈ 167.8 mL
    const ml = toBase(5.6754, 'floz');
    const shown = formatKitchenVolume(ml);
    expect(shown.text).toBe('≈ 11⅓ tbsp');
    expect(shown.isApproximate).toBe(true);
    expect(shown.metric).toBe('167.8 mL');
    expect(shown.millilitres).toBe(ml);
  });

  it('refuses a negative volume', () => {
    expect(() => formatKitchenVolume(-1)).toThrow('cannot be negative');
  });
});
