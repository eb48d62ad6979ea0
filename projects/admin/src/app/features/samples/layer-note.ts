import type { DescribedLayer } from '@layerbook/domain';

/** Looks words up by key with params (TranslateService.instant in the app, the English file in specs). */
export type Say = (key: string, params?: Record<string, unknown>) => string;

const N = 'samples.layerNote.';
const percent = (share: number) => `${Math.round(share * 100)} %`;

/**
 * The crew's note for one layer of a board, in the reader's language — the domain's crewLayerNote
 * word for word in English: "Mix by volume: 1 part Umber tint, 4 parts Glazing medium; glaze, 1 coat;
 * over 40 % of the surface; thinned 20 %; wait 4 h before the next layer".
 */
export function layerNote(layer: DescribedLayer, say: Say): string {
  const part = (p: { name: string; parts?: number }) =>
    say(`${N}${(p.parts ?? 1) === 1 ? 'partOne' : 'partMany'}`, { parts: p.parts ?? 1, name: p.name });
  const products =
    layer.products.length > 1
      ? say(`${N}mix`, {
          by: say(`${N}${layer.mixBy === 'weight' ? 'byWeight' : 'byVolume'}`),
          components: layer.products.map(part).join(', '),
        })
      : (layer.products[0]?.name ?? '');
  const method = say(`${N}methods.${layer.method}`);
  return [
    products,
    say(`${N}${layer.coats === 1 ? 'coatsOne' : 'coatsMany'}`, { method, coats: layer.coats }),
    layer.coverageShare !== undefined && layer.coverageShare < 1 ? say(`${N}share`, { percent: percent(layer.coverageShare) }) : '',
    layer.dilution ? say(`${N}thinned`, { percent: percent(layer.dilution.share) }) : '',
    layer.waitHoursAfter > 0 ? say(`${N}wait`, { hours: layer.waitHoursAfter }) : '',
  ]
    .filter(Boolean)
    .join('; ');
}
