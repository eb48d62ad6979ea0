/**
 * A finish as words, from the layers copied onto a sample board: one line per layer for the client
 * (what goes on, how, how many coats — never rates or prices) and a fuller note per layer for the
 * crew who must make the board again (mix parts, thinning, waiting times).
 */

/** One layer as a sample board records it, product names already resolved. */
export interface DescribedLayer {
  readonly position: number;
  readonly name: string;
  /** an application method: roll, brush, spray, trowel, … */
  readonly method: string;
  readonly coats: number;
  /** one product, or the components of a mix with their parts */
  readonly products: ReadonlyArray<{ readonly name: string; readonly parts?: number }>;
  readonly mixBy?: 'volume' | 'weight';
  /** share of the surface the layer covers (0.4 = 40 %), when not all of it */
  readonly coverageShare?: number;
  /** thinning, as a share of the mix (0.2 = 20 %) */
  readonly dilution?: { readonly share: number };
  readonly waitHoursAfter: number;
}

const METHOD_WORDS: Readonly<Record<string, string>> = {
  roll: 'rolled on',
  brush: 'brushed on',
  spray: 'sprayed',
  trowel: 'troweled on',
  burnish: 'burnished',
  glaze: 'glazed',
  wax: 'waxed',
  sand: 'sanded',
  stencil: 'stenciled',
  other: 'applied',
};

const COUNT_WORDS = ['no', 'one', 'two', 'three'];
const plural = (n: number, one: string, many = `${one}s`) => (n === 1 ? one : many);
const coatWords = (n: number) => `${COUNT_WORDS[n] ?? n} ${plural(n, 'coat')}`;
const percent = (share: number) => `${Math.round(share * 100)} %`;
const isPartial = (share: number | undefined): share is number => share !== undefined && share < 1;

/** "1. Primer: Acrylic primer, rolled on, one coat." — the client's reading of each layer, in order. */
export function clientFinishSteps(layers: readonly DescribedLayer[]): string[] {
  return layers.map((l) => {
    const what = l.products.length > 1 ? `a mix of ${l.products.map((p) => p.name).join(' and ')}` : (l.products[0]?.name ?? '');
    const share = isPartial(l.coverageShare) ? `, over about ${percent(l.coverageShare)} of the surface` : '';
    const parts = [what, METHOD_WORDS[l.method] ?? 'applied', coatWords(l.coats)].filter(Boolean).join(', ');
    return `${l.position}. ${l.name}: ${parts}${share}.`;
  });
}

/**
 * "Mix by volume: 1 part Umber tint, 4 parts Glazing medium; glaze, 1 coat; over 40 % of the
 * surface; thinned 20 %; wait 4 h before the next layer" — what the crew need to make it again.
 */
export function crewLayerNote(layer: DescribedLayer): string {
  const products =
    layer.products.length > 1
      ? `Mix by ${layer.mixBy ?? 'volume'}: ${layer.products.map((p) => `${p.parts ?? 1} ${plural(p.parts ?? 1, 'part')} ${p.name}`).join(', ')}`
      : (layer.products[0]?.name ?? '');
  return [
    products,
    `${layer.method}, ${layer.coats} ${plural(layer.coats, 'coat')}`,
    isPartial(layer.coverageShare) ? `over ${percent(layer.coverageShare)} of the surface` : '',
    layer.dilution ? `thinned ${percent(layer.dilution.share)}` : '',
    layer.waitHoursAfter > 0 ? `wait ${layer.waitHoursAfter} h before the next layer` : '',
  ]
    .filter(Boolean)
    .join('; ');
}
