// Stripe's v1 API takes application/x-www-form-urlencoded bodies (and query strings) with bracketed
// keys: `a[b][c]=1` nests, `a[0][x]=1` and `a[]=1` build arrays. We keep every container as a
// null-prototype object (so keys like `__proto__` in metadata are harmless) and let the parameter
// specs decide later whether a container is an array (all keys numeric) or a hash.
import { StripeFakeError } from './stripe-error';

export type FormValue = string | FormObject;
export interface FormObject {
  [key: string]: FormValue;
}

const MAX_PAIRS = 2000;
const MAX_DEPTH = 8;

export function emptyFormObject(): FormObject {
  return Object.create(null) as FormObject;
}

export function parseFormEncoded(raw: string): FormObject {
  const root = emptyFormObject();
  const pairs = [...new URLSearchParams(raw)];
  if (pairs.length > MAX_PAIRS) {
    throw StripeFakeError.invalidRequest(`Too many parameters: at most ${MAX_PAIRS} are accepted.`);
  }
  for (const [key, value] of pairs) {
    insertPair(root, splitKey(key), value, key);
  }
  return root;
}

/** `a[b][]` -> ['a', 'b', '']; an empty segment means "append". */
export function splitKey(key: string): string[] {
  const match = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(key);
  if (!match) {
    throw StripeFakeError.invalidRequest(`Invalid parameter name: ${key}`, { param: key });
  }
  const rest = match[2] ? [...match[2].matchAll(/\[([^[\]]*)\]/g)].map((m) => m[1]) : [];
  const segments = [match[1], ...rest];
  if (segments.length > MAX_DEPTH) {
    throw StripeFakeError.invalidRequest(`Parameter nested too deeply: ${key}`, { param: key });
  }
  return segments;
}

function insertPair(root: FormObject, segments: string[], value: string, fullKey: string): void {
  let container = root;
  for (let i = 0; i < segments.length; i += 1) {
    const segment = segments[i] === '' ? String(Object.keys(container).length) : segments[i];
    const isLast = i === segments.length - 1;
    const existing = container[segment];
    if (isLast) {
      if (existing !== undefined && typeof existing !== 'string') {
        throw StripeFakeError.invalidRequest(`Invalid hash: ${fullKey} is given both as a value and as a hash.`, {
          param: fullKey,
        });
      }
      container[segment] = value;
      return;
    }
    if (existing === undefined) {
      const child = emptyFormObject();
      container[segment] = child;
      container = child;
    } else if (typeof existing === 'string') {
      throw StripeFakeError.invalidRequest(`Invalid hash: ${fullKey} is given both as a value and as a hash.`, {
        param: fullKey,
      });
    } else {
      container = existing;
    }
  }
}

/** Sorted-key JSON, so two bodies with the same parameters in another order compare equal. */
export function canonicalForm(value: FormValue | undefined): string {
  if (value === undefined) return 'null';
  if (typeof value === 'string') return JSON.stringify(value);
  const keys = Object.keys(value).sort();
  return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalForm(value[k])}`).join(',')}}`;
}
