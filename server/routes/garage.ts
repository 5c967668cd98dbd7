import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import type { z } from 'zod';
import {
  createAlertInput,
  createGarageVehicleInput,
  garageAssemblyParams,
  garageLineParams,
  garageVehicleParams,
  labelsQuery,
  logEntryInput,
  needsQuery,
  noticesQuery,
  planInput,
  teardownUpdateInput,
  updateGarageVehicleInput,
  wantDeleteInput,
  wantInput,
} from '../../shared/schemas/garage';
import { requireUser } from '../auth/require-role';
import { AppError } from '../errors';
import { MAX_FILE_BYTES } from '../lib/photos/pipeline';
import { parseBody, parseParams, parseQuery } from '../lib/validate';
import * as garage from '../services/garage';
import { assemblyLabels } from '../services/labels';
import * as needsList from '../services/needs-list';
import { buildPlan, planToCart } from '../services/sourcing';
import * as teardown from '../services/teardown';

/** The restorer's garage. Every route is the signed-in owner's; another user's vehicle answers 404. */
export const garageRouter = Router();

const photosUpload: RequestHandler = (req, res, next) => {
  const mw = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: MAX_FILE_BYTES, files: teardown.MAX_PHOTOS_PER_LINE, fields: 10, fieldSize: 10_000 },
  }).array('photos', teardown.MAX_PHOTOS_PER_LINE);
  mw(req, res, (err?: unknown) => {
    if (!err) return next();
    if (!(err instanceof multer.MulterError)) return next(err);
    if (err.code === 'LIMIT_FILE_SIZE') {
      return next(new AppError(413, 'payload_too_large', `Each photo may be at most ${Math.floor(MAX_FILE_BYTES / 1048576)} MB; nothing was stored.`));
    }
    next(new AppError(400, 'validation_failed', `Send at most ${teardown.MAX_PHOTOS_PER_LINE} files in the "photos" field; nothing was stored.`, { fieldErrors: { photos: [err.message] } }));
  });
};

garageRouter.get('/vehicles', requireUser, async (req, res) => {
  res.json({ vehicles: await garage.listVehicles(req.user!.id) });
});

garageRouter.post('/vehicles', requireUser, async (req, res) => {
  res.status(201).json({ vehicle: await garage.createVehicle(req.user!.id, parseBody(createGarageVehicleInput, req)) });
});

garageRouter.get('/vehicles/:id', requireUser, async (req, res) => {
  res.json(await garage.getVehicle(req.user!.id, parseParams(garageVehicleParams, req).id));
});

garageRouter.patch('/vehicles/:id', requireUser, async (req, res) => {
  const { id } = parseParams(garageVehicleParams, req);
  res.json({ vehicle: await garage.updateVehicle(req.user!.id, id, parseBody(updateGarageVehicleInput, req)) });
});

garageRouter.delete('/vehicles/:id', requireUser, async (req, res) => {
  await garage.deleteVehicle(req.user!.id, parseParams(garageVehicleParams, req).id);
  res.status(204).end();
});

garageRouter.get('/vehicles/:id/assemblies/:assemblyId', requireUser, async (req, res) => {
  const { id, assemblyId } = parseParams(garageAssemblyParams, req);
  res.json(await teardown.getChecklist(req.user!.id, id, assemblyId));
});

garageRouter.get('/vehicles/:id/assemblies/:assemblyId/labels.pdf', requireUser, async (req, res) => {
  const { id, assemblyId } = parseParams(garageAssemblyParams, req);
  const q = parseQuery(labelsQuery, req);
  const out = await assemblyLabels(req.user!.id, id, assemblyId, { layout: q.layout, lines: q.lines });
  res.set({ 'Content-Type': 'application/pdf', 'Content-Disposition': `inline; filename="${out.filename}"`, 'Cache-Control': 'private, no-store' });
  res.send(out.pdf);
});

garageRouter.put('/vehicles/:id/teardown/:bomLineId', requireUser, async (req, res) => {
  const { id, bomLineId } = parseParams(garageLineParams, req);
  res.json(await teardown.updateItem(req.user!.id, id, bomLineId, parseBody(teardownUpdateInput, req)));
});

garageRouter.post('/vehicles/:id/teardown/:bomLineId/photos', requireUser, photosUpload, async (req, res) => {
  const { id, bomLineId } = parseParams(garageLineParams, req);
  const files = (req.files as Express.Multer.File[] | undefined) ?? [];
  res.status(201).json(await teardown.addPhotos(req.user!.id, id, bomLineId, files));
});

garageRouter.get('/vehicles/:id/log', requireUser, async (req, res) => {
  res.json({ entries: await teardown.listLog(req.user!.id, parseParams(garageVehicleParams, req).id) });
});

garageRouter.post('/vehicles/:id/log', requireUser, async (req, res) => {
  const { id } = parseParams(garageVehicleParams, req);
  res.status(201).json({ entry: await teardown.addLogEntry(req.user!.id, id, parseBody(logEntryInput, req)) });
});

garageRouter.get('/vehicles/:id/needs', requireUser, async (req, res) => {
  const { id } = parseParams(garageVehicleParams, req);
  if (parseQuery(needsQuery, req).format === 'csv') {
    const out = await needsList.needsCsv(req.user!.id, id);
    res.set({ 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="${out.filename}"`, 'Cache-Control': 'private, no-store' });
    res.send(out.csv);
    return;
  }
  res.json(await needsList.getNeeds(req.user!.id, id));
});

garageRouter.post('/vehicles/:id/wants', requireUser, async (req, res) => {
  const { id } = parseParams(garageVehicleParams, req);
  res.status(201).json({ want: await needsList.addWant(req.user!.id, id, parseBody(wantInput, req)) });
});

garageRouter.delete('/vehicles/:id/wants', requireUser, async (req, res) => {
  const { id } = parseParams(garageVehicleParams, req);
  const { wantId } = wantDeleteInput.parse({ ...(req.query ?? {}), ...(req.body ?? {}) });
  await needsList.deleteWant(req.user!.id, id, wantId);
  res.status(204).end();
});

// Also addressable by path, which is what most clients expect of a DELETE.
garageRouter.delete('/vehicles/:id/wants/:wantId', requireUser, async (req, res) => {
  const { id, wantId } = parseParams(garageVehicleParams.extend({ wantId: wantDeleteInput.shape.wantId }), req);
  await needsList.deleteWant(req.user!.id, id, wantId);
  res.status(204).end();
});

garageRouter.post('/vehicles/:id/plan', requireUser, async (req, res) => {
  const { id } = parseParams(garageVehicleParams, req);
  res.json(await buildPlan(req.user!.id, id, parseBody(planInput, req).destination));
});

garageRouter.post('/vehicles/:id/plan/to-cart', requireUser, async (req, res) => {
  const { id } = parseParams(garageVehicleParams, req);
  res.json(await planToCart(req.user!.id, id, parseBody(planInput, req).destination));
});

/**
 * OpenAPI entries of the garage, alerts and notices routes, in server/openapi/route-docs.ts's RouteDoc shape
 * (spread into routeDocs there: `...garageRouteDocs`).
 */
export const garageRouteDocs: Array<{
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  path: string;
  summary: string;
  body?: z.ZodType;
  query?: z.ZodObject;
  bodyType?: 'multipart/form-data';
  responses?: Record<number, string>;
}> = [
  { method: 'GET', path: '/api/garage/vehicles', summary: "The signed-in restorer's vehicles with overall teardown progress", responses: { 200: '{vehicles}' } },
  { method: 'POST', path: '/api/garage/vehicles', summary: 'Add a vehicle: model, serial as stamped, build date, variant, originality target', body: createGarageVehicleInput, responses: { 201: '{vehicle}' } },
  { method: 'GET', path: '/api/garage/vehicles/:id', summary: 'A vehicle with teardown progress per system and assembly', responses: { 200: '{vehicle, progress, systems}', 404: 'Not yours or no such vehicle' } },
  { method: 'PATCH', path: '/api/garage/vehicles/:id', summary: 'Change nickname, serial, build date, variant or originality target', body: updateGarageVehicleInput, responses: { 200: '{vehicle}', 404: 'Not found' } },
  { method: 'DELETE', path: '/api/garage/vehicles/:id', summary: 'Remove a vehicle with its checklist, photos, log and wants', responses: { 204: 'Removed', 404: 'Not found' } },
  { method: 'GET', path: '/api/garage/vehicles/:id/assemblies/:assemblyId', summary: "Teardown checklist of one assembly: the lines that apply to this vehicle, each with status, usable on hand, note, policy and photos", responses: { 200: '{assembly, lines, excluded, progress, vehicleProgress}', 404: 'Not found' } },
  { method: 'GET', path: '/api/garage/vehicles/:id/assemblies/:assemblyId/labels.pdf', summary: 'Bag-and-tag labels of the assembly as a PDF (layouts tag-50x30, letter-3x10, strip-100x40)', query: labelsQuery, responses: { 200: 'application/pdf', 404: 'Not found' } },
  { method: 'PUT', path: '/api/garage/vehicles/:id/teardown/:bomLineId', summary: 'Set the status, usable on hand, note or wanted condition of one checklist line', body: teardownUpdateInput, responses: { 200: '{bomLineId, teardown, needed}', 404: 'Not found', 409: 'The line does not apply to this vehicle' } },
  { method: 'POST', path: '/api/garage/vehicles/:id/teardown/:bomLineId/photos', summary: "Add photos to a checklist line (multipart field 'photos'; all or nothing)", bodyType: 'multipart/form-data', responses: { 201: '{bomLineId, photos}', 413: 'Too large', 415: 'Not a JPEG, PNG or WebP' } },
  { method: 'GET', path: '/api/garage/vehicles/:id/log', summary: 'The dated teardown log, newest first', responses: { 200: '{entries}' } },
  { method: 'POST', path: '/api/garage/vehicles/:id/log', summary: 'Add a note to the teardown log, optionally tied to a line', body: logEntryInput, responses: { 201: '{entry}' } },
  { method: 'GET', path: '/api/garage/vehicles/:id/needs', summary: 'The needs list (replace, missing, wrong part, plus wants); ?format=csv for a spreadsheet', query: needsQuery, responses: { 200: '{needs, notInspectedLines, totalUnits} or text/csv' } },
  { method: 'POST', path: '/api/garage/vehicles/:id/wants', summary: 'Add a want by hand to the needs list', body: wantInput, responses: { 201: '{want}' } },
  { method: 'DELETE', path: '/api/garage/vehicles/:id/wants', summary: 'Remove a want (wantId in the body or query)', body: wantDeleteInput, responses: { 204: 'Removed', 404: 'Not found' } },
  { method: 'DELETE', path: '/api/garage/vehicles/:id/wants/:wantId', summary: 'Remove a want', responses: { 204: 'Removed', 404: 'Not found' } },
  { method: 'POST', path: '/api/garage/vehicles/:id/plan', summary: 'Sourcing plan: live listings covering the needs at the lowest landed cost, with unfilled needs and the gap to a lower bound', body: planInput, responses: { 200: '{plan, unfilled, method, optimal, lowerBoundCents, gapCents, gapPercent, purchases}' } },
  { method: 'POST', path: '/api/garage/vehicles/:id/plan/to-cart', summary: 'Compute the plan and bring the cart up to its quantities', body: planInput, responses: { 200: '{added, warnings, plan}', 409: 'The plan buys nothing' } },
  { method: 'GET', path: '/api/alerts', summary: "The signed-in user's wanted alerts with hit counts", responses: { 200: '{alerts}' } },
  { method: 'POST', path: '/api/alerts', summary: 'Watch a part (by id or number, supersession-aware) with a condition policy and a top price', body: createAlertInput, responses: { 201: '{alert}' } },
  { method: 'DELETE', path: '/api/alerts/:id', summary: 'Stop watching', responses: { 204: 'Removed', 404: 'Not found' } },
  { method: 'GET', path: '/api/notices', summary: 'In-app notices, newest first, with the unread count', query: noticesQuery, responses: { 200: '{notices, unreadCount}' } },
  { method: 'POST', path: '/api/notices/read-all', summary: 'Mark every notice read', responses: { 200: '{marked}' } },
  { method: 'POST', path: '/api/notices/:id/read', summary: 'Mark one notice read', responses: { 200: '{notice}', 404: 'Not found' } },
];
