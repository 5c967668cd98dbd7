import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { allMounts } from '../../server/routes/index';
import { listRoutes } from '../../server/routes/route-table';
import { routeDocs } from '../../server/openapi/route-docs';

const app = createApp();
const key = (m: string, p: string) => `${m} ${p}`;
const DOC_ROUTES = new Set(['GET /api/openapi.json', 'GET /api/docs']);

describe('API documentation', () => {
  it('when a route exists in the router table, then the OpenAPI document describes it, and nothing else', () => {
    const routes = listRoutes(allMounts()).map((r) => key(r.method, r.path)).filter((k) => !DOC_ROUTES.has(k));
    const documented = routeDocs.map((d) => key(d.method, d.path));
    expect(routes.filter((r) => !documented.includes(r))).toEqual([]);
    expect(documented.filter((d) => !routes.includes(d))).toEqual([]);
  });

  it('when /api/openapi.json is fetched, then it is an OpenAPI 3.1 document with request schemas from zod', async () => {
    const r = await request(app).get('/api/openapi.json');
    expect(r.status).toBe(200);
    expect(r.body.openapi).toBe('3.1.0');
    const login = r.body.paths['/api/auth/login'].post;
    expect(login.requestBody.content['application/json'].schema.properties.email).toBeDefined();
    expect(r.body.paths['/api/parts/{id}'].get).toBeDefined();
    const page = await request(app).get('/api/docs');
    expect(page.status).toBe(200);
    expect(page.text).toContain('/api/parts/resolve');
  });
});
