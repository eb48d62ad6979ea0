import { describe, expect, it } from 'vitest';
import { crewLayerNote, type DescribedLayer } from '@layerbook/domain';
import samples from '../../../i18n/samples/en.json';
import { finishChoiceWords } from './finish-words';
import { layerNote } from './layer-note';

/** The English the translate pipe would show: the key looked up in samples/en.json, `{{param}}` filled in. */
function english(key: string, params: Record<string, unknown> = {}): string {
  let at: unknown = { samples };
  for (const part of key.split('.')) at = (at as Record<string, unknown>)[part];
  if (typeof at !== 'string') throw new Error(`no English words for ${key}`);
  return at.replace(/\{\{\s*(\w+)\s*\}\}/g, (_, name: string) => String(params[name]));
}

describe('finishChoiceWords', () => {
  it.each([
    ['Limewash', 1, 'Limewash (1 layer)'],
    ['Polished lime', 3, 'Polished lime (3 layers)'],
    ['Empty', 0, 'Empty (0 layers)'],
  ])('%s with %d layers reads "%s"', (name, count, text) => {
    const w = finishChoiceWords(name, count);
    expect(english(w.key, w.params)).toBe(text);
  });
});

describe('layerNote', () => {
  const layers: DescribedLayer[] = [
    {
      position: 1,
      name: 'Glaze',
      method: 'glaze',
      coats: 1,
      products: [
        { name: 'Umber tint', parts: 1 },
        { name: 'Glazing medium', parts: 4 },
      ],
      mixBy: 'volume',
      coverageShare: 0.4,
      dilution: { share: 0.2 },
      waitHoursAfter: 4,
    },
    { position: 2, name: 'Primer', method: 'roll', coats: 2, products: [{ name: 'Acrylic primer' }], waitHoursAfter: 0 },
    {
      position: 3,
      name: 'Wax',
      method: 'wax',
      coats: 1,
      products: [{ name: 'Paste wax' }, { name: 'Tint', parts: 2 }],
      mixBy: 'weight',
      waitHoursAfter: 16,
    },
  ];

  it.each(layers.map((l) => [l.name, l] as const))('%s reads in English as the domain words it', (_, layer) => {
    expect(layerNote(layer, english)).toBe(crewLayerNote(layer));
  });
});
