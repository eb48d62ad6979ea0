import { invalidRequest, resourceMissing } from './errors';
import { int, obj, type Params, str } from './params';

export interface ApiList<T> {
  object: 'list';
  data: T[];
  has_more: boolean;
  url: string;
}

/** `created` as a number or as {gt, gte, lt, lte}; true when `created` passes. */
export function createdFilter(params: Params): (created: number) => boolean {
  const exact = params['created'];
  if (exact === undefined) return () => true;
  if (typeof exact === 'string') {
    const at = int(params, 'created');
    return (c) => c === at;
  }
  const range = obj(params, 'created') ?? {};
  const bound = (k: string) => int(range, k, `created[${k}]`);
  const [gt, gte, lt, lte] = [bound('gt'), bound('gte'), bound('lt'), bound('lte')];
  return (c) =>
    (gt === undefined || c > gt) && (gte === undefined || c >= gte) && (lt === undefined || c < lt) && (lte === undefined || c <= lte);
}

/**
 * Stripe's cursor pagination over items already sorted newest first: limit 1–100 (default 10),
 * starting_after (older than that id) or ending_before (newer than that id).
 */
export function paginate<T extends { id: string }>(items: T[], params: Params, url: string, kind: string): ApiList<T> {
  const limit = int(params, 'limit') ?? 10;
  if (limit < 1 || limit > 100) throw invalidRequest('Limit must be between 1 and 100.', 'limit');
  const after = str(params, 'starting_after');
  const before = str(params, 'ending_before');
  if (after && before) throw invalidRequest('You may only specify one of these parameters: ending_before, starting_after.');
  if (before) {
    const at = items.findIndex((i) => i.id === before);
    if (at < 0) throw resourceMissing(kind, before, 'ending_before');
    const newer = items.slice(0, at);
    return { object: 'list', data: newer.slice(Math.max(0, newer.length - limit)), has_more: newer.length > limit, url };
  }
  let rest = items;
  if (after) {
    const at = items.findIndex((i) => i.id === after);
    if (at < 0) throw resourceMissing(kind, after, 'starting_after');
    rest = items.slice(at + 1);
  }
  return { object: 'list', data: rest.slice(0, limit), has_more: rest.length > limit, url };
}
