import { z } from 'zod';

/** Error codes used in every API error reply: `{error: {code, message, details?}}`. */
export const errorCodes = [
  'validation_failed',
  'unauthenticated',
  'forbidden',
  'not_found',
  'conflict',
  'rate_limited',
  'cross_site_refused',
  'payload_too_large',
  'unsupported_media',
  'invalid_state',
  'service_unavailable',
  'internal',
] as const;
export type ErrorCode = (typeof errorCodes)[number];

export const apiErrorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;
