// A small declarative checker for request parameters, so each endpoint states what it accepts and
// the stand-in answers unknown, missing or malformed parameters the way Stripe does (first problem
// wins, `param` names the bracketed path).
import type { FormObject, FormValue } from './form-encoding';
import { StripeFakeError } from './stripe-error';

interface Base {
  required?: boolean;
}
export type ParamSpec =
  | (Base & { kind: 'string'; maxLength?: number })
  | (Base & { kind: 'url' })
  | (Base & { kind: 'integer'; min?: number; max?: number })
  | (Base & { kind: 'boolean' })
  | (Base & { kind: 'enum'; values: readonly string[] })
  | (Base & { kind: 'metadata' })
  | (Base & { kind: 'object'; fields: Record<string, ParamSpec> })
  | (Base & { kind: 'array'; of: ParamSpec; maxItems?: number });

export const str = (extra: { required?: boolean; maxLength?: number } = {}): ParamSpec => ({ kind: 'string', ...extra });
export const url = (required = false): ParamSpec => ({ kind: 'url', required });
export const int = (extra: { required?: boolean; min?: number; max?: number } = {}): ParamSpec => ({
  kind: 'integer',
  ...extra,
});
export const bool = (): ParamSpec => ({ kind: 'boolean' });
export const oneOf = (values: readonly string[], required = false): ParamSpec => ({ kind: 'enum', values, required });
export const metadata = (): ParamSpec => ({ kind: 'metadata' });
export const obj = (fields: Record<string, ParamSpec>, required = false): ParamSpec => ({ kind: 'object', fields, required });
export const arr = (of: ParamSpec, extra: { required?: boolean; maxItems?: number } = {}): ParamSpec => ({
  kind: 'array',
  of,
  ...extra,
});

/** `expand[]` is accepted by every endpoint. */
export const EXPAND = arr(str(), { maxItems: 20 });
export const LIST_PARAMS: Record<string, ParamSpec> = {
  limit: int({ min: 1, max: 100 }),
  starting_after: str(),
  ending_before: str(),
  expand: EXPAND,
};

// source: Stripe API reference, "Metadata" (50 keys, key up to 40 characters, value up to 500), from memory
const METADATA_MAX_KEYS = 50;
const METADATA_KEY_MAX = 40;
const METADATA_VALUE_MAX = 500;

export function checkParams(input: FormObject, fields: Record<string, ParamSpec>): Record<string, unknown> {
  return checkObject(input, fields, '') as Record<string, unknown>;
}

function childPath(parent: string, key: string): string {
  return parent === '' ? key : `${parent}[${key}]`;
}

function checkObject(input: FormObject, fields: Record<string, ParamSpec>, path: string): Record<string, unknown> {
  for (const key of Object.keys(input)) {
    if (!Object.hasOwn(fields, key)) throw StripeFakeError.unknownParam(childPath(path, key));
  }
  const out: Record<string, unknown> = {};
  for (const [key, spec] of Object.entries(fields)) {
    const value = checkValue(input[key], spec, childPath(path, key));
    if (value !== undefined) out[key] = value;
  }
  return out;
}

function checkValue(value: FormValue | undefined, spec: ParamSpec, path: string): unknown {
  if (value === undefined || value === '') {
    if (spec.required && value === '') {
      throw StripeFakeError.invalidParam(
        path,
        `You passed an empty string for '${path}'. We assume empty values are an attempt to unset a parameter; however '${path}' cannot be unset. You should remove '${path}' from your request or supply a non-empty value.`,
      );
    }
    if (spec.required) throw StripeFakeError.missingParam(path);
    // Metadata keeps '' so updates can unset keys; everything else treats '' as "not given".
    return spec.kind === 'metadata' && value === '' ? {} : undefined;
  }
  switch (spec.kind) {
    case 'string': {
      const s = expectString(value, path);
      if (spec.maxLength !== undefined && s.length > spec.maxLength) {
        throw StripeFakeError.invalidParam(path, `Invalid string: ${path} must be at most ${spec.maxLength} characters long.`);
      }
      return s;
    }
    case 'url': {
      const s = expectString(value, path);
      let parsed: URL;
      try {
        parsed = new URL(s);
      } catch {
        throw StripeFakeError.invalidParam(path, `Not a valid URL`, 'url_invalid');
      }
      if (parsed.protocol !== 'http:' && parsed.protocol !== 'https:') {
        throw StripeFakeError.invalidParam(path, `Not a valid URL`, 'url_invalid');
      }
      return s;
    }
    case 'integer': {
      const s = expectString(value, path);
      if (!/^-?\d+$/.test(s) || !Number.isSafeInteger(Number(s))) {
        throw StripeFakeError.invalidParam(path, `Invalid integer: ${s}`, 'parameter_invalid_integer');
      }
      const n = Number(s);
      if (spec.min !== undefined && n < spec.min) {
        throw StripeFakeError.invalidParam(path, `This value must be greater than or equal to ${spec.min}.`);
      }
      if (spec.max !== undefined && n > spec.max) {
        throw StripeFakeError.invalidParam(path, `This value must be less than or equal to ${spec.max}.`);
      }
      return n;
    }
    case 'boolean': {
      const s = expectString(value, path);
      if (s !== 'true' && s !== 'false') throw StripeFakeError.invalidParam(path, `Invalid boolean: ${s}`);
      return s === 'true';
    }
    case 'enum': {
      const s = expectString(value, path);
      if (!spec.values.includes(s)) {
        throw StripeFakeError.invalidParam(path, `Invalid ${path}: must be one of ${spec.values.join(', ')}`);
      }
      return s;
    }
    case 'metadata':
      return checkMetadata(value, path);
    case 'object':
      if (typeof value === 'string') throw StripeFakeError.invalidParam(path, `Invalid object`);
      return checkObject(value, spec.fields, path);
    case 'array': {
      const items = asArray(value, path);
      if (spec.maxItems !== undefined && items.length > spec.maxItems) {
        throw StripeFakeError.invalidParam(path, `Invalid array: ${path} can have at most ${spec.maxItems} items.`);
      }
      return items.map((item, i) => {
        const checked = checkValue(item, { ...spec.of, required: true }, `${path}[${i}]`);
        return checked;
      });
    }
  }
}

function expectString(value: FormValue, path: string): string {
  if (typeof value !== 'string') throw StripeFakeError.invalidParam(path, `Invalid string: {...} given for ${path}`);
  return value;
}

function asArray(value: FormValue, path: string): FormValue[] {
  if (typeof value === 'string') throw StripeFakeError.invalidParam(path, `Invalid array`);
  const keys = Object.keys(value);
  if (!keys.every((k) => /^\d+$/.test(k))) throw StripeFakeError.invalidParam(path, `Invalid array`);
  return keys.sort((a, b) => Number(a) - Number(b)).map((k) => value[k]);
}

function checkMetadata(value: FormValue, path: string): Record<string, string> {
  if (typeof value === 'string') throw StripeFakeError.invalidParam(path, `Invalid object`);
  const keys = Object.keys(value);
  if (keys.length > METADATA_MAX_KEYS) {
    throw StripeFakeError.invalidParam(path, `Invalid metadata: metadata can have up to ${METADATA_MAX_KEYS} keys, but you passed in ${keys.length} keys.`);
  }
  const out: Record<string, string> = {};
  for (const key of keys) {
    const v = value[key];
    if (typeof v !== 'string') throw StripeFakeError.invalidParam(`${path}[${key}]`, `Invalid metadata: values must be strings.`);
    if (key.length > METADATA_KEY_MAX) {
      throw StripeFakeError.invalidParam(`${path}[${key}]`, `Invalid metadata: keys can be at most ${METADATA_KEY_MAX} characters long.`);
    }
    if (v.length > METADATA_VALUE_MAX) {
      throw StripeFakeError.invalidParam(`${path}[${key}]`, `Invalid metadata: values can be at most ${METADATA_VALUE_MAX} characters long.`);
    }
    out[key] = v;
  }
  return out;
}

/** Metadata on create: '' values mean "no such key". */
export function createMetadata(given: Record<string, string> | undefined): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(given ?? {})) if (v !== '') out[k] = v;
  return out;
}

/** Metadata on update: merge, '' removes a key (Stripe's rule). */
export function mergeMetadata(current: Record<string, string>, given: Record<string, string> | undefined): Record<string, string> {
  if (given === undefined) return current;
  if (Object.keys(given).length === 0) return {};
  const out = { ...current };
  for (const [k, v] of Object.entries(given)) {
    if (v === '') delete out[k];
    else out[k] = v;
  }
  return out;
}
