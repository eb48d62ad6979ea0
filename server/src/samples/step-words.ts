import type { Language } from '@layerbook/contracts';
import type { DescribedLayer } from '@layerbook/domain';
import { translator, type Translate } from '../i18n/catalog';

/**
 * The client's reading of each finish step (the domain's clientFinishSteps) in the reader's language:
 * every word the system writes comes from the catalog by a stable key (`samples.steps.*`); what the
 * firm typed — the layer's name, the products' names — goes in as typed. The English catalog says
 * exactly what clientFinishSteps says (step-words.spec.ts checks it), so the office and the client
 * read the same steps.
 */
const S = 'samples.steps.';

/** Methods with words of their own; any other reads "applied" (as in the domain). */
const METHODS = new Set(['roll', 'brush', 'spray', 'trowel', 'burnish', 'glaze', 'wax', 'sand', 'stencil', 'other']);

const COATS = ['coatsNone', 'coatsOne', 'coatsTwo', 'coatsThree'];

function stepIn(t: Translate, l: DescribedLayer): string {
  const names = l.products.map((p) => p.name);
  const what = names.length > 1 ? t(`${S}mix`, { products: names.join(t(`${S}and`)) }) : (names[0] ?? '');
  const method = t(`${S}methods.${METHODS.has(l.method) ? l.method : 'other'}`);
  const coats = t(`${S}${COATS[l.coats] ?? 'coatsMany'}`, { count: l.coats });
  const share = l.coverageShare !== undefined && l.coverageShare < 1 ? t(`${S}share`, { percent: Math.round(l.coverageShare * 100) }) : '';
  return t(`${S}line`, { position: l.position, name: l.name, parts: [what, method, coats].filter(Boolean).join(', '), share });
}

/** "1. Primer: Acrylic primer, rolled on, one coat." — or "1. Primer: Acrylic primer, con rodillo, una mano." */
export function clientFinishStepsIn(layers: readonly DescribedLayer[], language: Language): string[] {
  const t = translator(language);
  return layers.map((l) => stepIn(t, l));
}
