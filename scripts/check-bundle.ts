// Page-weight budget, checked after `vite build` (part of npm test): initial JavaScript (the entry chunk and
// everything it imports statically) at most 170 KB gzipped, each lazily loaded route chunk at most 100 KB.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';

interface ManifestChunk {
  file: string;
  isEntry?: boolean;
  isDynamicEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
}

export const BUDGET = { initialKb: 170, routeChunkKb: 100 };

export function measureBundle(distDir = 'dist/client') {
  const manifest = JSON.parse(readFileSync(path.join(distDir, '.vite', 'manifest.json'), 'utf8')) as Record<string, ManifestChunk>;
  const gz = (file: string) => gzipSync(readFileSync(path.join(distDir, file)), { level: 9 }).length / 1024;
  const staticClosure = (key: string, seen = new Set<string>()) => {
    if (seen.has(key)) return seen;
    seen.add(key);
    for (const i of manifest[key]?.imports ?? []) staticClosure(i, seen);
    return seen;
  };
  const entry = Object.keys(manifest).find((k) => manifest[k].isEntry)!;
  const initial = staticClosure(entry);
  const initialKb = [...initial].reduce((sum, k) => sum + gz(manifest[k].file), 0);
  const routes = Object.entries(manifest)
    .filter(([k, c]) => c.isDynamicEntry && !initial.has(k))
    .map(([k]) => {
      // a route chunk plus the shared chunks it needs that the initial load did not bring
      const extra = [...staticClosure(k)].filter((x) => !initial.has(x));
      return { name: k, kb: extra.reduce((sum, x) => sum + gz(manifest[x].file), 0) };
    })
    .sort((a, b) => b.kb - a.kb);
  return { initialKb, routes };
}

if (process.argv[1]?.endsWith('check-bundle.ts')) {
  const { initialKb, routes } = measureBundle();
  console.log(`[bundle] initial JavaScript ${initialKb.toFixed(1)} KB gzipped (budget ${BUDGET.initialKb} KB)`);
  for (const r of routes.slice(0, 5)) console.log(`[bundle] route ${r.name}: ${r.kb.toFixed(1)} KB gzipped`);
  const over = routes.filter((r) => r.kb > BUDGET.routeChunkKb);
  if (initialKb > BUDGET.initialKb || over.length) {
    console.error(`[bundle] over budget: ${initialKb > BUDGET.initialKb ? 'initial load; ' : ''}${over.map((r) => r.name).join(', ')}`);
    process.exit(1);
  }
  console.log(`[bundle] within budget (largest route ${routes[0]?.kb.toFixed(1) ?? 0} KB, budget ${BUDGET.routeChunkKb} KB)`);
}
