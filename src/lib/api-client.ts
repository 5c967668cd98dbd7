import type { z } from 'zod';
import { apiErrorBodySchema } from '@shared/errors';
import { env } from '@/config/env';

/** A failed API call. `status` 0 means the request never got an HTTP answer (offline, DNS, aborted proxy). */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: unknown;

  constructor(init: { status: number; code: string; message: string; details?: unknown }) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.details = init.details;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/** `details.fieldErrors` of a validation reply, or an empty object. */
export function fieldErrorsOf(error: unknown): Record<string, string[]> {
  if (!isApiError(error) || typeof error.details !== 'object' || error.details === null) return {};
  const fieldErrors = (error.details as { fieldErrors?: unknown }).fieldErrors;
  if (typeof fieldErrors !== 'object' || fieldErrors === null) return {};
  const out: Record<string, string[]> = {};
  for (const [field, messages] of Object.entries(fieldErrors)) {
    if (Array.isArray(messages)) out[field] = messages.filter((m): m is string => typeof m === 'string');
  }
  return out;
}

// Used when the server (or a proxy in front of it) answers without our error shape.
const fallbackByStatus: Record<number, { code: string; message: string }> = {
  400: { code: 'validation_failed', message: 'The request was not accepted.' },
  401: { code: 'unauthenticated', message: 'Please sign in.' },
  403: { code: 'forbidden', message: 'You are not allowed to do that.' },
  404: { code: 'not_found', message: 'Not found.' },
  409: { code: 'conflict', message: 'That conflicts with the current state.' },
  413: { code: 'payload_too_large', message: 'That upload is too large.' },
  429: { code: 'rate_limited', message: 'Too many attempts. Wait a little and try again.' },
  503: { code: 'service_unavailable', message: 'The service is unavailable. Try again shortly.' },
};

async function errorFromResponse(response: Response): Promise<ApiError> {
  let body: unknown;
  try {
    body = await response.json();
  } catch {
    body = undefined;
  }
  const parsed = apiErrorBodySchema.safeParse(body);
  if (parsed.success) {
    const { code, message, details } = parsed.data.error;
    return new ApiError({ status: response.status, code, message, details });
  }
  const fallback = fallbackByStatus[response.status] ?? {
    code: response.status >= 500 ? 'internal' : 'http_error',
    message: response.status >= 500 ? 'Something went wrong on our side. Try again.' : `Request failed (${response.status}).`,
  };
  return new ApiError({ status: response.status, ...fallback });
}

export type RequestOptions<T> = {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
  /** When given, the reply is checked against it; a mismatch throws ApiError code 'invalid_response'. */
  schema?: z.ZodType<T>;
  headers?: Record<string, string>;
};

/** The one fetch wrapper: JSON in and out, same-origin cookies, typed errors. */
export async function apiRequest<T = unknown>(path: string, options: RequestOptions<T> = {}): Promise<T> {
  const { method = 'GET', body, signal, schema, headers = {} } = options;
  const init: RequestInit = {
    method,
    credentials: 'same-origin',
    headers: { Accept: 'application/json', ...headers },
    signal,
  };
  if (body !== undefined) {
    init.body = JSON.stringify(body);
    (init.headers as Record<string, string>)['Content-Type'] = 'application/json';
  }

  let response: Response;
  try {
    response = await fetch(`${env.VITE_API_BASE_URL}${path}`, init);
  } catch (error) {
    // Let cancellation through untouched so TanStack Query treats it as a cancel, not a failure.
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError({ status: 0, code: 'network_error', message: 'Could not reach Drabyard. Check your connection and try again.' });
  }

  if (!response.ok) throw await errorFromResponse(response);
  if (response.status === 204 || response.status === 205) return undefined as T;

  const text = await response.text();
  let data: unknown = undefined;
  if (text !== '') {
    try {
      data = JSON.parse(text);
    } catch {
      throw new ApiError({ status: response.status, code: 'invalid_response', message: 'The server sent a reply we could not read.' });
    }
  }
  if (!schema) return data as T;
  const checked = schema.safeParse(data);
  if (!checked.success) {
    throw new ApiError({
      status: response.status,
      code: 'invalid_response',
      message: 'The server sent a reply we did not expect.',
      details: { issues: checked.error.issues },
    });
  }
  return checked.data;
}

type Opts<T> = Omit<RequestOptions<T>, 'method' | 'body'>;

export const api = {
  get: <T = unknown>(path: string, opts?: Opts<T>) => apiRequest<T>(path, { ...opts, method: 'GET' }),
  post: <T = unknown>(path: string, body?: unknown, opts?: Opts<T>) => apiRequest<T>(path, { ...opts, method: 'POST', body }),
  put: <T = unknown>(path: string, body?: unknown, opts?: Opts<T>) => apiRequest<T>(path, { ...opts, method: 'PUT', body }),
  patch: <T = unknown>(path: string, body?: unknown, opts?: Opts<T>) => apiRequest<T>(path, { ...opts, method: 'PATCH', body }),
  delete: <T = unknown>(path: string, opts?: Opts<T>) => apiRequest<T>(path, { ...opts, method: 'DELETE' }),
};
