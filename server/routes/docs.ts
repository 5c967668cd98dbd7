import { Router } from 'express';
import { publicRoute } from '../auth/require-role';
import { openApiDocument } from '../openapi/document';

export const docsRouter = Router();

docsRouter.get('/openapi.json', publicRoute, (_req, res) => {
  res.json(openApiDocument());
});

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** A readable page of the API, rendered on the server (no scripts, so it passes our CSP). */
docsRouter.get('/docs', publicRoute, (_req, res) => {
  const doc = openApiDocument() as { paths: Record<string, Record<string, { summary?: string; description?: string }>> };
  const rows = Object.entries(doc.paths).flatMap(([p, ops]) =>
    Object.entries(ops).map(([m, op]) => `<tr><td><code>${m.toUpperCase()}</code></td><td><code>${esc(p)}</code></td><td>${esc(op.summary ?? '')}<br><small>${esc(op.description ?? '')}</small></td></tr>`),
  );
  res.type('html').send(`<!doctype html><html lang="en"><meta charset="utf-8"><title>Drabyard API</title>
<body style="font-family:sans-serif;margin:2rem;max-width:70rem;color:#24211c;background:#f7f3ea">
<h1>Drabyard API</h1><p>Machine-readable: <a href="/api/openapi.json">/api/openapi.json</a> (OpenAPI 3.1). Errors are <code>{error: {code, message, details?}}</code>.</p>
<table cellpadding="6" style="border-collapse:collapse" border="1"><thead><tr><th>Method</th><th>Path</th><th>What and who</th></tr></thead><tbody>${rows.join('')}</tbody></table></body></html>`);
});
