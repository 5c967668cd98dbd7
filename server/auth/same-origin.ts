import type { RequestHandler } from 'express';
import { AppError } from '../errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cross-site request protection without tokens: a state-changing request must say it comes from our own
 * site, by its Origin header or, where a browser sends no Origin, by Sec-Fetch-Site. Requests that carry
 * neither are refused too, so a client must identify itself. Webhooks are signed and skip this check.
 */
export function requireSameOrigin(allowedOrigins: string[], skipPaths: string[] = []): RequestHandler {
  const allowed = new Set(allowedOrigins.map((o) => o.replace(/\/$/, '')));
  return (req, _res, next) => {
    if (SAFE.has(req.method) || skipPaths.some((p) => req.path === p)) return next();
    const origin = req.get('origin');
    if (origin) {
      if (allowed.has(origin)) return next();
      return next(new AppError(403, 'cross_site_refused', 'This request came from another site and was refused'));
    }
    const site = req.get('sec-fetch-site');
    if (site === 'same-origin') return next();
    next(new AppError(403, 'cross_site_refused', 'State-changing requests must carry an Origin header of this site'));
  };
}
