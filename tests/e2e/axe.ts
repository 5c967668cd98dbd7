// axe-core in the browser under the app's own CSP. `script-src 'self'` blocks an injected <script> (which is
// what addScriptTag does with a file), so axe's source is evaluated through the DevTools protocol instead:
// that evaluation is not subject to the page's CSP, and the product's policy stays as strict as it ships.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

export type Impact = 'minor' | 'moderate' | 'serious' | 'critical';

export interface Violation {
  id: string;
  impact: Impact | null;
  help: string;
  helpUrl: string;
  /** CSS selectors of the offending nodes (at most five), and a short summary of the first one's failure. */
  targets: string[];
  nodeCount: number;
  summary: string;
}

export const BLOCKING: readonly Impact[] = ['serious', 'critical'];

let axeSource: string | undefined;
function source(): string {
  axeSource ??= readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
  return axeSource;
}

/** Runs axe on the page as it is now (wait for the page's content first) and returns its violations. */
export async function runAxe(page: Page, opts: { exclude?: string[] } = {}): Promise<Violation[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.evaluate(source());
  return page.evaluate(async (exclude) => {
    const axe = (window as unknown as { axe: { run: (ctx: unknown, o: unknown) => Promise<{ violations: AxeViolation[] }> } }).axe;
    type AxeViolation = { id: string; impact: string | null; help: string; helpUrl: string; nodes: Array<{ target: unknown[]; failureSummary?: string }> };
    const context = exclude.length ? { include: [document], exclude: exclude.map((s) => [s]) } : document;
    const r = await axe.run(context, { resultTypes: ['violations'] });
    return r.violations.map((v) => ({
      id: v.id,
      impact: v.impact as Impact | null,
      help: v.help,
      helpUrl: v.helpUrl,
      targets: v.nodes.slice(0, 5).map((n) => n.target.map(String).join(' ')),
      nodeCount: v.nodes.length,
      summary: (v.nodes[0]?.failureSummary ?? '').replace(/\s+/g, ' ').slice(0, 240),
    }));
  }, opts.exclude ?? []);
}

export const isBlocking = (v: Violation) => v.impact !== null && BLOCKING.includes(v.impact);

/** A plain-text table of every violation by page, for the test log. */
export function violationTable(byPage: ReadonlyArray<{ page: string; violations: Violation[] }>): string {
  const rows: string[][] = [['page', 'impact', 'rule', 'nodes', 'first target', 'help']];
  for (const { page, violations } of byPage) {
    if (!violations.length) rows.push([page, '-', '(none)', '0', '', '']);
    for (const v of violations) rows.push([page, v.impact ?? '?', v.id, String(v.nodeCount), v.targets[0] ?? '', v.help]);
  }
  const widths = rows[0].map((_, i) => Math.min(60, Math.max(...rows.map((r) => r[i].length))));
  return rows.map((r) => r.map((c, i) => (c.length > widths[i] ? `${c.slice(0, widths[i] - 1)}…` : c.padEnd(widths[i]))).join('  ').trimEnd()).join('\n');
}
