import type { Router } from 'express';
import type { Guard } from '../auth/require-role';

export interface RouteInfo {
  method: string;
  path: string;
  guard: Guard | null;
}

interface Layer {
  route?: { path: string; methods: Record<string, boolean>; stack: Array<{ handle: { guard?: Guard } }> };
}

/** Lists every route of the mounted routers with the guard of its first handler (null = no guard declared). */
export function listRoutes(mounts: ReadonlyArray<readonly [string, Router]>): RouteInfo[] {
  const out: RouteInfo[] = [];
  for (const [prefix, router] of mounts) {
    for (const layer of (router as unknown as { stack: Layer[] }).stack) {
      if (!layer.route) continue;
      const guard = layer.route.stack[0]?.handle.guard ?? null;
      for (const [method, on] of Object.entries(layer.route.methods)) {
        if (!on || method === '_all') continue;
        const p = `/api${prefix === '/' ? '' : prefix}${layer.route.path === '/' ? '' : layer.route.path}`;
        out.push({ method: method.toUpperCase(), path: p || '/api', guard });
      }
    }
  }
  return out;
}
