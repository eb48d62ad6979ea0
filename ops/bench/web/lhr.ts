/** The few parts of a Lighthouse result (LHR) the phone benchmark prints, read defensively. */

interface LhrNode {
  nodeLabel?: string;
  selector?: string;
  snippet?: string;
}

interface LhrAudit {
  score: number | null;
  scoreDisplayMode?: string;
  errorMessage?: string;
  numericValue?: number;
  details?: { type?: string; items?: Array<Record<string, unknown>> };
}

export interface Lhr {
  finalDisplayedUrl: string;
  runtimeError?: { code: string; message: string };
  runWarnings?: string[];
  environment?: { benchmarkIndex?: number };
  categories: Record<string, { score: number | null; auditRefs: Array<{ id: string; weight: number }> }>;
  audits: Record<string, LhrAudit | undefined>;
}

export interface PageFigures {
  performance: number;
  accessibility: number;
  lcpMs: number;
  cls: number;
  tbtMs: number;
  fcpMs: number;
  transferBytes: number;
  requests: number;
  scriptBytes: number;
  fontBytes: number;
  benchmarkIndex: number;
  /** null when Lighthouse could not tell (its audit errored: elementsError says why) */
  lcpElement: string | null;
  clsCulprits: string[] | null;
  elementsError?: string;
  failedAudits: string[];
  warnings: string[];
}

export const median = (values: number[]): number => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
};

const score = (lhr: Lhr, category: string) => Math.round((lhr.categories[category]?.score ?? 0) * 100);
const numeric = (lhr: Lhr, audit: string) => lhr.audits[audit]?.numericValue ?? NaN;

const describeNode = (node: LhrNode | undefined) =>
  node ? `${node.selector ?? '?'} "${(node.nodeLabel ?? node.snippet ?? '').replace(/\s+/g, ' ').slice(0, 70)}"` : 'unknown';

/** The first DOM node an audit's details name, looking into nested tables and lists. */
function firstNode(value: unknown): LhrNode | undefined {
  if (!value || typeof value !== 'object') return undefined;
  const record = value as Record<string, unknown>;
  if (record.type === 'node') return record;
  for (const key of ['node', 'items']) {
    const inner = record[key];
    const found = Array.isArray(inner) ? inner.map(firstNode).find(Boolean) : firstNode(inner);
    if (found) return found;
  }
  return undefined;
}

/** The layout shifts Lighthouse lists, largest first: score, element, and the likely causes it names. */
function culprits(lhr: Lhr): string[] {
  const items = lhr.audits['layout-shifts']?.details?.items ?? [];
  return items.slice(0, 5).map((item) => {
    const causes = ((item.subItems as { items?: Array<{ cause?: string; extra?: { value?: string } }> } | undefined)?.items ?? [])
      .map((c) => `${c.cause ?? ''}${c.extra?.value ? ` ${c.extra.value}` : ''}`.trim())
      .filter(Boolean);
    const shift = typeof item.score === 'number' ? item.score.toFixed(3) : '?';
    return `${shift} ${describeNode(item.node as LhrNode | undefined)}${causes.length > 0 ? ` — ${causes.join('; ')}` : ''}`;
  });
}

/** Bytes and count of the resource summary's row of one type (script, font, total). */
function resources(lhr: Lhr, type: string): { bytes: number; count: number } {
  const row = (lhr.audits['resource-summary']?.details?.items ?? []).find((i) => i.resourceType === type);
  return { bytes: Number(row?.transferSize ?? NaN), count: Number(row?.requestCount ?? NaN) };
}

const errored = (lhr: Lhr, audit: string) => lhr.audits[audit]?.scoreDisplayMode === 'error' || !lhr.audits[audit];

export function pageFigures(lhr: Lhr): PageFigures {
  const a11y = lhr.categories.accessibility?.auditRefs ?? [];
  const total = resources(lhr, 'total');
  return {
    performance: score(lhr, 'performance'),
    accessibility: score(lhr, 'accessibility'),
    lcpMs: numeric(lhr, 'largest-contentful-paint'),
    cls: numeric(lhr, 'cumulative-layout-shift'),
    tbtMs: numeric(lhr, 'total-blocking-time'),
    fcpMs: numeric(lhr, 'first-contentful-paint'),
    transferBytes: total.bytes,
    requests: total.count,
    scriptBytes: resources(lhr, 'script').bytes,
    fontBytes: resources(lhr, 'font').bytes,
    benchmarkIndex: lhr.environment?.benchmarkIndex ?? NaN,
    lcpElement: errored(lhr, 'largest-contentful-paint-element')
      ? null
      : describeNode(firstNode(lhr.audits['largest-contentful-paint-element']?.details)),
    clsCulprits: errored(lhr, 'layout-shifts') ? null : culprits(lhr),
    elementsError: lhr.audits['largest-contentful-paint-element']?.errorMessage ?? lhr.audits['layout-shifts']?.errorMessage,
    failedAudits: a11y.filter((r) => r.weight > 0 && lhr.audits[r.id]?.score === 0).map((r) => r.id),
    warnings: lhr.runWarnings ?? [],
  };
}
