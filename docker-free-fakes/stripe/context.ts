import type { FormObject } from './form-encoding';
import { expandObject } from './expand';
import type { FakeState } from './state';
import { StripeFakeError } from './stripe-error';

export type Json = Record<string, unknown>;

export interface ApiContext {
  state: FakeState;
  /** Parsed body (POST) or query string (GET). */
  params: FormObject;
  /** Named parts of the route path, e.g. `{ id }`. */
  path: Record<string, string>;
  /** Base of the stand-in's own pages (hosted payment, onboarding). */
  publicBaseUrl: string;
}

export interface ApiResult {
  status?: number;
  body: Json;
}

export type ApiHandler = (ctx: ApiContext) => ApiResult;

/** Clone (so callers never hold live state) and apply `expand[]`. */
export function render(state: FakeState, object: object, expand: unknown): ApiResult {
  const paths = Array.isArray(expand) ? (expand as string[]) : [];
  return { body: expandObject(state, structuredClone(object) as Json, paths) };
}

export function mustFind<T>(table: Map<string, T>, id: string, noun: string): T {
  const found = table.get(id);
  if (!found) throw StripeFakeError.noSuch(noun, id);
  return found;
}
