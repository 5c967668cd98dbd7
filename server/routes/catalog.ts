import { Router } from 'express';
import { z } from 'zod';
import {
  assemblyQuery,
  createAssemblyInput,
  createLineInput,
  createPartInput,
  createSupersessionInput,
  partNumberInput,
  resolveQuery,
  slugParam,
  updateAssemblyInput,
  updateLineInput,
  updatePartInput,
  uuidParam,
} from '../../shared/schemas/catalog';
import { publicRoute, requireRole } from '../auth/require-role';
import { clearReadCaches } from '../lib/read-cache';
import { parseBody, parseParams, parseQuery } from '../lib/validate';
import * as catalog from '../services/catalog';
import * as admin from '../services/catalog-admin';

export const catalogRouter = Router();

catalogRouter.get('/vehicles', publicRoute, async (_req, res) => {
  res.json({ vehicles: await catalog.listVehicles() });
});

catalogRouter.get('/vehicles/:slug', publicRoute, async (req, res) => {
  res.json(await catalog.getVehicle(parseParams(slugParam, req).slug));
});

catalogRouter.get('/assemblies/:id', publicRoute, async (req, res) => {
  const { id } = parseParams(uuidParam, req);
  res.json(await catalog.getAssembly(id, parseQuery(assemblyQuery, req)));
});

// Declared before /parts/:id so "resolve" is not read as an id.
catalogRouter.get('/parts/resolve', publicRoute, async (req, res) => {
  res.json(await catalog.resolveNumber(parseQuery(resolveQuery, req).number));
});

catalogRouter.get('/parts/:id', publicRoute, async (req, res) => {
  res.json(await catalog.getPart(parseParams(uuidParam, req).id));
});

export const adminCatalogRouter = Router();
const isAdmin = requireRole('admin');
// Any successful catalog edit clears the cached public reads of this process.
adminCatalogRouter.use((req, res, next) => {
  if (req.method !== 'GET') res.on('finish', () => res.statusCode < 400 && clearReadCaches());
  next();
});
const twoIds = z.object({ id: z.uuid(), numberId: z.uuid() });

adminCatalogRouter.post('/parts', isAdmin, async (req, res) => {
  res.status(201).json({ part: await admin.createPart(req.user!, parseBody(createPartInput, req)) });
});
adminCatalogRouter.patch('/parts/:id', isAdmin, async (req, res) => {
  res.json({ part: await admin.updatePart(req.user!, parseParams(uuidParam, req).id, parseBody(updatePartInput, req)) });
});
adminCatalogRouter.delete('/parts/:id', isAdmin, async (req, res) => {
  await admin.deletePart(req.user!, parseParams(uuidParam, req).id);
  res.status(204).end();
});
adminCatalogRouter.post('/parts/:id/numbers', isAdmin, async (req, res) => {
  res.status(201).json({ number: await admin.addNumber(req.user!, parseParams(uuidParam, req).id, parseBody(partNumberInput, req)) });
});
adminCatalogRouter.delete('/parts/:id/numbers/:numberId', isAdmin, async (req, res) => {
  const { id, numberId } = parseParams(twoIds, req);
  await admin.deleteNumber(req.user!, id, numberId);
  res.status(204).end();
});
adminCatalogRouter.post('/supersessions', isAdmin, async (req, res) => {
  res.status(201).json({ supersession: await admin.createSupersession(req.user!, parseBody(createSupersessionInput, req)) });
});
adminCatalogRouter.delete('/supersessions/:id', isAdmin, async (req, res) => {
  await admin.deleteSupersession(req.user!, parseParams(uuidParam, req).id);
  res.status(204).end();
});
adminCatalogRouter.post('/assemblies', isAdmin, async (req, res) => {
  res.status(201).json({ assembly: await admin.createAssembly(req.user!, parseBody(createAssemblyInput, req)) });
});
adminCatalogRouter.patch('/assemblies/:id', isAdmin, async (req, res) => {
  res.json({ assembly: await admin.updateAssembly(req.user!, parseParams(uuidParam, req).id, parseBody(updateAssemblyInput, req)) });
});
adminCatalogRouter.delete('/assemblies/:id', isAdmin, async (req, res) => {
  await admin.deleteAssembly(req.user!, parseParams(uuidParam, req).id);
  res.status(204).end();
});
adminCatalogRouter.post('/lines', isAdmin, async (req, res) => {
  res.status(201).json({ line: await admin.createLine(req.user!, parseBody(createLineInput, req)) });
});
adminCatalogRouter.patch('/lines/:id', isAdmin, async (req, res) => {
  res.json({ line: await admin.updateLine(req.user!, parseParams(uuidParam, req).id, parseBody(updateLineInput, req)) });
});
adminCatalogRouter.delete('/lines/:id', isAdmin, async (req, res) => {
  await admin.deleteLine(req.user!, parseParams(uuidParam, req).id);
  res.status(204).end();
});
adminCatalogRouter.get('/data-quality', isAdmin, async (_req, res) => {
  res.json(await admin.dataQuality());
});
