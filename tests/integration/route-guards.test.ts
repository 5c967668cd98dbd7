import { describe, expect, it } from 'vitest';
import { allMounts } from '../../server/routes/index';
import { listRoutes } from '../../server/routes/route-table';

describe('router table', () => {
  it('when the API routes are listed, then every one declares who may call it', () => {
    const routes = listRoutes(allMounts());
    expect(routes.length).toBeGreaterThan(20);
    const unguarded = routes.filter((r) => r.guard === null).map((r) => `${r.method} ${r.path}`);
    expect(unguarded).toEqual([]);
  });

  it('when a route lives under /api/admin, then it needs the admin role', () => {
    const admin = listRoutes(allMounts()).filter((r) => r.path.startsWith('/api/admin/'));
    expect(admin.length).toBeGreaterThan(5);
    for (const r of admin) expect(r.guard, `${r.method} ${r.path}`).toEqual({ kind: 'role', roles: ['admin'] });
  });
});
