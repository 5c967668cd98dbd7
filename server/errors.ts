import type { ErrorRequestHandler } from 'express';
import { ZodError } from 'zod';
import type { ErrorCode } from '../shared/errors';
import { logger } from './lib/logger';

/** The one error type services throw; the error middleware turns it into `{error: {code, message, details?}}`. */
export class AppError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: ErrorCode,
    message: string,
    public readonly details?: unknown,
    public readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const notFound = (what = 'Resource') => new AppError(404, 'not_found', `${what} not found`);
export const forbidden = (message = 'You are not allowed to do this') => new AppError(403, 'forbidden', message);
export const unauthenticated = (message = 'Sign in first') => new AppError(401, 'unauthenticated', message);
export const invalidState = (message: string, details?: unknown) => new AppError(409, 'invalid_state', message, details);

export function zodDetails(err: ZodError) {
  const fieldErrors: Record<string, string[]> = {};
  const formErrors: string[] = [];
  for (const issue of err.issues) {
    if (issue.path.length === 0) formErrors.push(issue.message);
    else (fieldErrors[issue.path.join('.')] ??= []).push(issue.message);
  }
  return { fieldErrors, formErrors };
}

const DB_DOWN_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', '57P01', '57P02', '57P03', '08006', '08001', '08003']);

export function isDatabaseUnavailable(err: unknown): boolean {
  let e: unknown = err;
  for (let i = 0; i < 4 && e && typeof e === 'object'; i++) {
    const code = (e as { code?: string }).code;
    const msg = (e as { message?: string }).message ?? '';
    if ((code && DB_DOWN_CODES.has(code)) || /Connection terminated|connect ECONNREFUSED|timeout exceeded when trying to connect/i.test(msg)) {
      return true;
    }
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}

/** The PostgreSQL SQLSTATE of an error or of one of its causes (drizzle wraps the driver's error). */
function pgCode(err: unknown): string | undefined {
  let e: unknown = err;
  for (let i = 0; i < 4 && e && typeof e === 'object'; i++) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === 'string' && /^[0-9A-Z]{5}$/.test(code)) return code;
    e = (e as { cause?: unknown }).cause;
  }
  return undefined;
}

// Text PostgreSQL cannot store (a NUL character, bytes that are not UTF-8) is the caller's input, not our failure.
const BAD_TEXT_CODES = new Set(['22021', '22P05']);

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  let status = 500;
  let body: { code: string; message: string; details?: unknown } = { code: 'internal', message: 'Something went wrong on our side' };
  if (err instanceof AppError) {
    status = err.status;
    body = { code: err.code, message: err.message, ...(err.details === undefined ? {} : { details: err.details }) };
    if (err.headers) res.set(err.headers);
  } else if (err instanceof ZodError) {
    status = 400;
    body = { code: 'validation_failed', message: 'Some fields are not valid', details: zodDetails(err) };
  } else if (err?.type === 'entity.parse.failed') {
    status = 400;
    body = { code: 'validation_failed', message: 'The request body is not valid JSON' };
  } else if (err?.type === 'entity.too.large' || err?.status === 413) {
    status = 413;
    body = { code: 'payload_too_large', message: 'The request is too large' };
  } else if (BAD_TEXT_CODES.has(pgCode(err) ?? '')) {
    status = 400;
    body = { code: 'validation_failed', message: 'The text sent contains characters that cannot be stored (such as a NUL character)' };
  } else if (isDatabaseUnavailable(err)) {
    status = 503;
    body = { code: 'service_unavailable', message: 'The database is unavailable right now; please try again in a moment' };
    res.set('Retry-After', '5');
  } else if (typeof err?.status === 'number' && err.status >= 400 && err.status < 500) {
    status = err.status;
    body = { code: status === 404 ? 'not_found' : 'validation_failed', message: err.expose ? String(err.message) : 'Bad request' };
  }
  if (status >= 500) (req.log ?? logger).error({ err }, 'request failed');
  if (res.headersSent) return;
  res.status(status).json({ error: body });
};
