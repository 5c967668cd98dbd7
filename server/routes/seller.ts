import { Router } from 'express';
import { z } from 'zod';
import { shippingProfileInput, shopProfileInput, updateShippingProfileInput } from '../../shared/schemas/listings';
import { requireRole } from '../auth/require-role';
import { parseBody, parseParams } from '../lib/validate';
import * as sellers from '../services/seller-profiles';

/** Mounted at /me: only the shop and shipping paths, so other /me routes fall through to their own routers. */
export const sellerRouter = Router();
const isSeller = requireRole('seller');
const idParam = z.object({ id: z.uuid('Not a valid shipping profile id') });

sellerRouter.get('/shop', isSeller, async (req, res) => {
  res.json({ shop: await sellers.getShop(req.user!.id) });
});

sellerRouter.put('/shop', isSeller, async (req, res) => {
  res.json({ shop: await sellers.saveShop(req.user!, parseBody(shopProfileInput, req)) });
});

sellerRouter.get('/shipping-profiles', isSeller, async (req, res) => {
  res.json({ profiles: await sellers.listShippingProfiles(req.user!.id) });
});

sellerRouter.post('/shipping-profiles', isSeller, async (req, res) => {
  res.status(201).json({ profile: await sellers.createShippingProfile(req.user!, parseBody(shippingProfileInput, req)) });
});

sellerRouter.patch('/shipping-profiles/:id', isSeller, async (req, res) => {
  const { id } = parseParams(idParam, req);
  res.json({ profile: await sellers.updateShippingProfile(req.user!, id, parseBody(updateShippingProfileInput, req)) });
});

sellerRouter.delete('/shipping-profiles/:id', isSeller, async (req, res) => {
  await sellers.deleteShippingProfile(req.user!, parseParams(idParam, req).id);
  res.status(204).end();
});
