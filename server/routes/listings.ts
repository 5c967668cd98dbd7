import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import {
  createListingInput,
  importCommitInput,
  importPreviewInput,
  LISTING_LIMITS,
  myListingsQuery,
  photoOrderInput,
  publicListingsQuery,
  updateListingInput,
} from '../../shared/schemas/listings';
import { publicRoute, requireRole } from '../auth/require-role';
import { AppError } from '../errors';
import { MAX_FILE_BYTES, MAX_FILES } from '../lib/photos/pipeline';
import { parseBody, parseParams, parseQuery } from '../lib/validate';
import * as imports from '../services/listing-import';
import * as listings from '../services/listings';

export const listingsRouter = Router();
export const myListingsRouter = Router();

const idParam = z.object({ id: z.uuid('Not a valid listing id') });
const photoParam = idParam.extend({ photoId: z.uuid('Not a valid photo id') });
const isSeller = requireRole('seller');

/** Multer's own errors become our JSON errors: too big is 413, too many or a wrong field is 400. */
function multerError(err: unknown, field: string, maxFiles: number, maxBytes: number): unknown {
  if (!(err instanceof multer.MulterError)) return err;
  const mb = Math.floor(maxBytes / (1024 * 1024));
  switch (err.code) {
    case 'LIMIT_FILE_SIZE':
      return new AppError(413, 'payload_too_large', `Each file may be at most ${mb} MB; nothing was stored.`, { fieldErrors: { [field]: [`At most ${mb} MB per file`] } });
    case 'LIMIT_FILE_COUNT':
      return new AppError(400, 'validation_failed', `Upload at most ${maxFiles} file${maxFiles === 1 ? '' : 's'} at once; nothing was stored.`, { fieldErrors: { [field]: [`At most ${maxFiles} files`] } });
    case 'LIMIT_UNEXPECTED_FILE':
      return new AppError(400, 'validation_failed', `Send files only in the "${field}" field, at most ${maxFiles}; "${err.field ?? ''}" was not expected. Nothing was stored.`, {
        fieldErrors: { [field]: [`Use the "${field}" field, at most ${maxFiles} files`] },
      });
    default:
      return new AppError(400, 'validation_failed', `The upload could not be read (${err.message}); nothing was stored.`);
  }
}

function memoryUpload(field: string, maxFiles: number, maxBytes: number): RequestHandler {
  const mw = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: maxFiles, fields: 20, fieldSize: 100_000, parts: maxFiles + 20 },
  }).array(field, maxFiles);
  return (req, res, next) => mw(req, res, (err?: unknown) => next(err ? multerError(err, field, maxFiles, maxBytes) : undefined));
}

const photosUpload = memoryUpload('photos', MAX_FILES, MAX_FILE_BYTES);
const csvUpload = memoryUpload('file', 1, LISTING_LIMITS.importBytesMax);

// --- public ----------------------------------------------------------------------------------------

listingsRouter.get('/', publicRoute, async (req, res) => {
  const q = parseQuery(publicListingsQuery, req);
  res.json({ listings: await listings.liveListingsForParts(q.partId, q.limit) });
});

/** Live and sold-out listings for everyone; other states for their seller and administrators only (404 otherwise). */
listingsRouter.get('/:id', publicRoute, async (req, res) => {
  res.json(await listings.getListingPage(parseParams(idParam, req).id, req.user));
});

// --- the seller's own listings -------------------------------------------------------------------------

listingsRouter.post('/', isSeller, async (req, res) => {
  const row = await listings.createListing(req.user!, parseBody(createListingInput, req));
  res.status(201).json({ listing: await listings.toDto(row, { withFlags: true }) });
});

listingsRouter.patch('/:id', isSeller, async (req, res) => {
  const { id } = parseParams(idParam, req);
  const row = await listings.updateListing(req.user!, id, parseBody(updateListingInput, req));
  res.json({ listing: await listings.toDto(row, { withFlags: true }) });
});

listingsRouter.delete('/:id', isSeller, async (req, res) => {
  await listings.deleteDraft(req.user!, parseParams(idParam, req).id);
  res.status(204).end();
});

listingsRouter.post('/:id/submit', isSeller, async (req, res) => {
  const { listing } = await listings.submitListing(req.user!, parseParams(idParam, req).id);
  res.json({ listing: await listings.toDto(listing, { withFlags: true }) });
});

for (const action of ['withdraw', 'reopen'] as const) {
  listingsRouter.post(`/:id/${action}`, isSeller, async (req, res) => {
    const row = await listings.sellerAction(req.user!, parseParams(idParam, req).id, action);
    res.json({ listing: await listings.toDto(row, { withFlags: true }) });
  });
}

// Ownership and state are checked before the body is read, so a refused upload never reaches the pipeline.
const photoTarget: RequestHandler = async (req, _res, next) => {
  await listings.assertCanAddPhotos(req.user!, parseParams(idParam, req).id);
  next();
};

listingsRouter.post('/:id/photos', isSeller, photoTarget, photosUpload, async (req, res) => {
  const files = (req.files as Express.Multer.File[] | undefined) ?? [];
  const r = await listings.addPhotos(req.user!, parseParams(idParam, req).id, files);
  res.status(201).json({ listing: await listings.toDto(r.listing, { withFlags: true }), photos: r.photos });
});

listingsRouter.put('/:id/photos/order', isSeller, async (req, res) => {
  const photos = await listings.setPhotoOrder(req.user!, parseParams(idParam, req).id, parseBody(photoOrderInput, req).photoIds);
  res.json({ photos });
});

listingsRouter.delete('/:id/photos/:photoId', isSeller, async (req, res) => {
  const { id, photoId } = parseParams(photoParam, req);
  const row = await listings.removePhoto(req.user!, id, photoId);
  res.json({ listing: await listings.toDto(row, { withFlags: true }) });
});

// --- dashboard and bulk import (mounted at /me/listings) ---------------------------------------------

myListingsRouter.get('/', isSeller, async (req, res) => {
  res.json(await listings.myListings(req.user!, parseQuery(myListingsQuery, req)));
});

myListingsRouter.get('/import/template', isSeller, (_req, res) => {
  res.type('text/csv').attachment('drabyard-listings-template.csv').send(imports.importTemplate());
});

/** The CSV comes as JSON `{csv, mapping?}` or as a multipart upload (field `file`, with `mapping` as JSON text). */
const csvBody: RequestHandler = (req, res, next) => {
  if (!req.is('multipart/form-data')) return next();
  csvUpload(req, res, (err?: unknown) => {
    if (err) return next(err);
    const [file] = (req.files as Express.Multer.File[] | undefined) ?? [];
    const body = (req.body ?? {}) as Record<string, string>;
    let mapping: unknown;
    try {
      mapping = body.mapping ? JSON.parse(body.mapping) : undefined;
    } catch {
      return next(new AppError(400, 'validation_failed', 'The mapping is not valid JSON', { fieldErrors: { mapping: ['Not valid JSON'] } }));
    }
    req.body = {
      csv: file ? file.buffer.toString('utf8') : '',
      ...(mapping !== undefined ? { mapping } : {}),
      ...(body.as ? { as: body.as } : {}),
      ...(body.skipInvalid ? { skipInvalid: /^(true|1|yes)$/i.test(body.skipInvalid) } : {}),
    };
    next();
  });
};

myListingsRouter.post('/import/preview', isSeller, csvBody, async (req, res) => {
  res.json(await imports.previewImport(req.user!, parseBody(importPreviewInput, req)));
});

myListingsRouter.post('/import', isSeller, csvBody, async (req, res) => {
  res.status(201).json(await imports.commitImport(req.user!, parseBody(importCommitInput, req)));
});
