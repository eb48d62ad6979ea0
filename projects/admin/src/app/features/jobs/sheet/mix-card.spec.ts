import { TestBed } from '@angular/core/testing';
import { describe, expect, it } from 'vitest';
import { Language } from '../../../../../../shared/i18n/language';
import { provideTestI18n } from '../../../../../../shared/i18n/testing';
import en from '../../../../i18n/sheet/en.json';
import es from '../../../../i18n/sheet/es.json';
import { MixCard } from './mix-card';
import { glazeLayer, limeLayer, products } from './sheet-fixtures';

async function render(layer = glazeLayer, language: 'en' | 'es' = 'en') {
  TestBed.configureTestingModule({ providers: [provideTestI18n({ sheet: language === 'es' ? es : en }, language)] });
  await TestBed.inject(Language).use(language);
  const fixture = TestBed.createComponent(MixCard);
  fixture.componentRef.setInput('layer', layer);
  fixture.componentRef.setInput('products', products);
  fixture.componentRef.setInput('firmUnits', 'imperial');
  await fixture.whenStable();
  const host = fixture.nativeElement as HTMLElement;
  const rows = () =>
    Array.from(host.querySelectorAll('tbody tr')).map((tr) =>
      Array.from(tr.children).map((c) => (c.textContent ?? '').replace(/\s+/g, ' ').trim()),
    );
  const type = async (amount: string, unit?: string) => {
    const input = host.querySelector('input') as HTMLInputElement;
    input.value = amount;
    input.dispatchEvent(new Event('input'));
    if (unit) {
      const select = host.querySelector('select') as HTMLSelectElement;
      select.value = unit;
      select.dispatchEvent(new Event('change'));
    }
    await fixture.whenStable();
  };
  return { host, rows, type };
}

describe('MixCard', () => {
  it('starts from a quart and shows each part and the water in kitchen measures and metric', async () => {
    const { host, rows } = await render();
    expect(host.querySelector('h4')?.textContent).toContain('Mix card: Glaze coat');
    expect((host.querySelector('select') as HTMLSelectElement).value).toBe('quart');
    // 1 qt = 946.35 mL (NIST Handbook 44 App. C); water 10 % of the concentrate, then 1 : 4 (the layer recipe).
    // 172.06 mL is 0.73 cup (¾ is 3 % off) but 11.64 tbsp: the engine picks the unit whose common fraction is within 2 %.
    expect(rows()).toEqual([
      ['Umber base paint base', '≈ 11⅔ tbsp', '172.1 mL'],
      ['Oil glazing medium', '≈ 46½ tbsp', '688.3 mL'],
      ['Water', '≈ 5¾ tbsp', '86.0 mL'],
    ]);
  });

  it('scales to the batch the crew types', async () => {
    const { rows, type } = await render();
    await type('2', 'gallon');
    // 2 gal = 7570.82 mL; paint = 7570.82 / 1.1 / 5 = 1376.5 mL
    expect(rows()[0]).toEqual(['Umber base paint base', '≈ 5¾ cups', '1.38 L']);
    expect(rows()[2][2]).toBe('688.3 mL');
  });

  it('says so when the batch is not above zero', async () => {
    const { host, type } = await render();
    await type('0');
    expect(host.querySelector('[role="alert"]')?.textContent).toContain('Enter a batch above zero.');
    expect(host.querySelector('table')).toBeNull();
  });

  it('weighs a weight recipe in kilograms and grams with no kitchen column', async () => {
    const { host, rows, type } = await render(limeLayer);
    await type('10.3');
    expect(Array.from(host.querySelectorAll('thead th')).map((th) => th.textContent?.trim())).toEqual(['Part', 'Metric']);
    expect(rows()).toEqual([
      ['Slaked lime putty base', '10.00 kg'],
      ['Earth pigment', '300.0 g'],
    ]);
    expect(host.textContent).toContain('By weight: weigh each part');
  });

  it('reads in Spanish: units and water in the reader language, metric in its number format', async () => {
    const { rows } = await render(glazeLayer, 'es');
    expect(rows()[2]).toEqual(['Agua', '≈ 5¾ cdas', '86.0 mL']);
  });

  it('shows no money: no currency sign or price word anywhere on the card', async () => {
    const { host } = await render();
    expect(host.textContent).not.toMatch(/[$€£]|price|cost|total|amount/i);
  });
});
