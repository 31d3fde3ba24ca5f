// Stripe's v1 API takes application/x-www-form-urlencoded bodies whose keys use bracket notation
// (`line_items[0][price_data][currency]=eur`, `expand[]=payment_intent`). This turns such a body
// into nested plain objects with string leaves; whether a level is a list is decided by the
// request schema (see `request-params.ts`), because `metadata[0]=x` is a valid metadata key.

export type FormValue = string | FormObject;
export interface FormObject {
  [key: string]: FormValue;
}

export class FormEncodingError extends Error {}

// Keys that would reach Object.prototype if written into a plain object.
const FORBIDDEN_SEGMENTS = new Set(['__proto__', 'prototype', 'constructor']);

export function parseFormEncoded(text: string): FormObject {
  const root: FormObject = {};
  for (const [key, value] of new URLSearchParams(text)) {
    assign(root, splitKey(key), value, key);
  }
  return root;
}

function splitKey(key: string): string[] {
  const match = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(key);
  if (!match) throw new FormEncodingError(`Invalid parameter name: ${key}`);
  const [, head = '', brackets = ''] = match;
  const rest = [...brackets.matchAll(/\[([^[\]]*)\]/g)].map((m) => m[1] ?? '');
  return [head, ...rest];
}

function assign(target: FormObject, segments: string[], value: string, fullKey: string): void {
  let node = target;
  segments.forEach((rawSegment, index) => {
    // `key[]` appends: it takes the next free index, as Stripe (and qs) read it.
    const segment = rawSegment === '' ? String(Object.keys(node).length) : rawSegment;
    if (FORBIDDEN_SEGMENTS.has(segment)) throw new FormEncodingError(`Invalid parameter name: ${fullKey}`);
    const isLast = index === segments.length - 1;
    const existing = node[segment];
    if (isLast) {
      if (typeof existing === 'object') throw new FormEncodingError(`Invalid parameter: ${fullKey} is a hash`);
      node[segment] = value;
      return;
    }
    if (typeof existing === 'string') throw new FormEncodingError(`Invalid parameter: ${fullKey} mixes a value and a hash`);
    const child: FormObject = existing ?? {};
    node[segment] = child;
    node = child;
  });
}

/** Reads a form level sent as a list (`a[0]`, `a[1]` or `a[]`) back into an array, ordered by index. */
export function formListToArray(value: unknown): unknown {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return value;
  const entries = Object.entries(value);
  if (!entries.every(([key]) => /^\d+$/.test(key))) return value;
  return entries.sort(([a], [b]) => Number(a) - Number(b)).map(([, item]) => item);
}
