import { invalidRequest, missingParam, unknownParam } from './errors';

/** Decoded form or query parameters (qs bracket syntax): nested objects, arrays and strings. */
export type Params = Record<string, unknown>;

/** Refuses parameters the endpoint does not know, as Stripe does ("Received unknown parameter"). */
export function onlyKnown(params: Params, known: readonly string[], prefix = ''): void {
  for (const key of Object.keys(params)) {
    if (!known.includes(key)) throw unknownParam(prefix ? `${prefix}[${key}]` : key);
  }
}

export function str(params: Params, name: string, param = name): string | undefined {
  const v = params[name];
  if (v === undefined) return undefined;
  if (typeof v !== 'string') throw invalidRequest(`Invalid string: ${JSON.stringify(v)}`, param);
  return v;
}

export function requiredStr(params: Params, name: string, param = name): string {
  const v = str(params, name, param);
  if (v === undefined || v === '') throw missingParam(param);
  return v;
}

export function int(params: Params, name: string, param = name): number | undefined {
  const v = params[name];
  if (v === undefined || v === '') return undefined;
  if (typeof v !== 'string' || !/^-?\d+$/.test(v))
    throw invalidRequest(`Invalid integer: ${typeof v === 'string' ? v : JSON.stringify(v)}`, param);
  return Number(v);
}

export function obj(params: Params, name: string, param = name): Params | undefined {
  const v = params[name];
  if (v === undefined || v === '') return undefined;
  if (typeof v !== 'object' || v === null || Array.isArray(v)) throw invalidRequest(`Invalid object`, param);
  return v as Params;
}

/** An array parameter: qs gives `a[0]=x&a[1]=y` as an array, and more than 20 entries as an object. */
export function list(params: Params, name: string, param = name): unknown[] | undefined {
  const v = params[name];
  if (v === undefined || v === '') return undefined;
  if (Array.isArray(v)) {
    const items: unknown[] = v;
    return items;
  }
  if (typeof v === 'object' && v !== null) return Object.values(v as Record<string, unknown>);
  throw invalidRequest(`Invalid array`, param);
}

/** Stripe metadata: up to 50 string keys of ≤ 40 characters, values ≤ 500; '' unsets. */
export function metadata(params: Params, name = 'metadata', param = name): Record<string, string> | undefined {
  const m = obj(params, name, param);
  if (!m) return params[name] === '' ? {} : undefined;
  const out: Record<string, string> = {};
  const keys = Object.keys(m);
  if (keys.length > 50) throw invalidRequest('Metadata can have up to 50 keys.', param);
  for (const key of keys) {
    const value = m[key];
    if (typeof value !== 'string') throw invalidRequest(`Invalid string: ${JSON.stringify(value)}`, `${param}[${key}]`);
    if (key.length > 40) throw invalidRequest('Metadata keys can be up to 40 characters long.', `${param}[${key}]`);
    if (value.length > 500) throw invalidRequest('Metadata values can be up to 500 characters long.', `${param}[${key}]`);
    if (value !== '') out[key] = value;
  }
  return out;
}

/** `expand[]` of a request: the paths asked for. */
export function expandList(params: Params): string[] {
  return (list(params, 'expand') ?? []).map(String);
}
