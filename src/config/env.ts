import { z } from 'zod';

// Only these VITE_ variables reach the client; anything else in import.meta.env is ignored, so a
// secret added to .env by mistake is never read by app code.
const clientEnvSchema = z.object({
  MODE: z.string().default('production'),
  DEV: z.boolean().default(false),
  // Prefix for API calls. Empty means same origin (the server serves the client, or Vite proxies /api).
  // Only same-origin paths are allowed: the API client sends cookies with credentials 'same-origin'.
  VITE_API_BASE_URL: z
    .string()
    .default('')
    .refine((v) => v === '' || (v.startsWith('/') && !v.startsWith('//') && !v.endsWith('/')), {
      message: 'VITE_API_BASE_URL must be empty or a same-origin path like "/backend" (no trailing slash)',
    }),
});

export type ClientEnv = z.infer<typeof clientEnvSchema>;

export function parseClientEnv(raw: Record<string, unknown>): ClientEnv {
  const result = clientEnvSchema.safeParse({
    MODE: raw.MODE,
    DEV: raw.DEV,
    VITE_API_BASE_URL: raw.VITE_API_BASE_URL,
  });
  if (!result.success) {
    const problems = result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
    throw new Error(`Invalid client environment: ${problems}`);
  }
  return result.data;
}

export const env = parseClientEnv(import.meta.env);
