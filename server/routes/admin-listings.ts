import { Router } from 'express';
import { z } from 'zod';
import { adminListingsQuery, bulkApproveInput, linkPartInput, listingDecisionInput } from '../../shared/schemas/listings';
import { requireRole } from '../auth/require-role';
import { parseBody, parseParams, parseQuery } from '../lib/validate';
import * as moderation from '../services/listing-moderation';

/** Mounted at /admin/listings. */
export const adminListingsRouter = Router();
const isAdmin = requireRole('admin');
const idParam = z.object({ id: z.uuid('Not a valid listing id') });

adminListingsRouter.get('/', isAdmin, async (req, res) => {
  res.json(await moderation.reviewQueue(parseQuery(adminListingsQuery, req)));
});

adminListingsRouter.post('/approve', isAdmin, async (req, res) => {
  res.json(await moderation.approveMany(req.user!, parseBody(bulkApproveInput, req).ids));
});

adminListingsRouter.post('/:id/decision', isAdmin, async (req, res) => {
  const { id } = parseParams(idParam, req);
  res.json({ listing: await moderation.decide(req.user!, id, parseBody(listingDecisionInput, req)) });
});

adminListingsRouter.post('/:id/part', isAdmin, async (req, res) => {
  const { id } = parseParams(idParam, req);
  res.json({ listing: await moderation.linkPart(req.user!, id, parseBody(linkPartInput, req).partId) });
});
