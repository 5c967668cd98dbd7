import { OpenAPIRegistry, OpenApiGeneratorV31 } from '@asteasolutions/zod-to-openapi';
import type { Guard } from '../auth/require-role';
import { allMounts } from '../routes/index';
import { listRoutes } from '../routes/route-table';
import { routeDocs } from './route-docs';

const who = (g: Guard | null) =>
  !g ? 'undeclared' : g.kind === 'public' ? 'anyone' : g.kind === 'user' ? 'any signed-in user' : g.kind === 'signature' ? 'signed by the payment provider' : `role: ${g.roles.join(' or ')}`;

const toOpenApiPath = (p: string) => p.replace(/:([A-Za-z]+)/g, '{$1}');

let cached: unknown;

/** The OpenAPI 3.1 document, built from the route table and the same zod schemas the routes parse with. */
export function openApiDocument() {
  if (cached) return cached;
  const registry = new OpenAPIRegistry();
  const guards = new Map(listRoutes(allMounts()).map((r) => [`${r.method} ${r.path}`, r.guard]));
  for (const d of routeDocs) {
    const guard = guards.get(`${d.method} ${d.path}`) ?? null;
    const params = [...d.path.matchAll(/:([A-Za-z]+)/g)].map((m) => m[1]);
    registry.registerPath({
      method: d.method.toLowerCase() as 'get',
      path: toOpenApiPath(d.path),
      summary: d.summary,
      description: `Who may call: ${who(guard)}. State-changing requests need an Origin of this site.`,
      ...(guard && guard.kind !== 'public' && guard.kind !== 'signature' ? { security: [{ session: [] }] } : {}),
      request: {
        ...(d.query ? { query: d.query } : {}),
        ...(d.body ? { body: { content: { [d.bodyType ?? 'application/json']: { schema: d.body } } } } : {}),
      },
      parameters: params.map((name) => ({ name, in: 'path' as const, required: true, schema: { type: 'string' as const } })),
      responses: Object.fromEntries(
        Object.entries({ 200: 'OK', ...(d.responses ?? {}), ...(d.method !== 'GET' ? { 400: 'Validation failed: {error: {code, message, details}}', 403: 'Refused' } : {}) }).map(([status, description]) => [status, { description }]),
      ),
    });
  }
  registry.registerComponent('securitySchemes', 'session', { type: 'apiKey', in: 'cookie', name: 'drabyard.sid' });
  cached = new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: '3.1.0',
    info: { title: 'Drabyard API', version: '0.1.0', description: 'Parts catalog and sourcing marketplace for vintage military vehicle restorers. Errors are {error: {code, message, details?}}.' },
    servers: [{ url: '/' }],
  });
  return cached;
}
