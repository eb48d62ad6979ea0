import { invalidRequest } from './errors';
import type { FakeState } from './state';

type Json = Record<string, unknown>;

/** Any stored object by its id (the prefix tells the kind). */
export function findObject(state: FakeState, id: string): Json | undefined {
  if (id.startsWith('cs_')) {
    const record = state.sessions.get(id);
    return record ? (record.session as unknown as Json) : undefined;
  }
  const found = state.paymentIntents.get(id) ?? state.charges.get(id) ?? state.refunds.get(id) ?? state.customers.get(id);
  return found as unknown as Json | undefined;
}

/**
 * A copy of `object` with the `expand[]` paths replaced by the objects they name (`payment_intent`,
 * `payment_intent.latest_charge`, `line_items` of a session, `data.payment_intent` in a list …).
 */
export function expand<T>(state: FakeState, object: T, paths: string[]): T {
  const copy = JSON.parse(JSON.stringify(object)) as Json;
  for (const path of paths) {
    if (path.split('.').length > 4) throw invalidRequest('You cannot expand more than 4 levels of a property.', 'expand');
    expandPath(state, copy, path.split('.'), path);
  }
  return copy as T;
}

function expandPath(state: FakeState, target: Json, segments: string[], whole: string): void {
  const [field, ...rest] = segments;
  if (field === undefined) return;
  if (field === 'data' && target['object'] === 'list' && Array.isArray(target['data'])) {
    for (const item of target['data'] as Json[]) expandPath(state, item, rest, whole);
    return;
  }
  if (field === 'line_items' && target['object'] === 'checkout.session') {
    const record = state.sessions.get(target['id'] as string);
    target['line_items'] = {
      object: 'list',
      data: record?.lineItems ?? [],
      has_more: false,
      url: `/v1/checkout/sessions/${String(target['id'])}/line_items`,
    };
    return;
  }
  if (field === 'refunds' && target['object'] === 'charge') {
    const refunds = [...state.refunds.values()].filter((r) => r.charge === target['id']).sort(state.compareNewestFirst);
    target['refunds'] = { object: 'list', data: refunds, has_more: false, url: `/v1/charges/${String(target['id'])}/refunds` };
    return;
  }
  if (!(field in target)) throw invalidRequest(`This property cannot be expanded (${whole}).`, 'expand');
  let value = target[field];
  if (typeof value === 'string') {
    const found = findObject(state, value);
    if (!found) throw invalidRequest(`This property cannot be expanded (${whole}).`, 'expand');
    value = JSON.parse(JSON.stringify(found)) as Json;
    target[field] = value;
  }
  if (value && typeof value === 'object' && rest.length > 0) expandPath(state, value as Json, rest, whole);
}
