import { Router, type Request } from 'express';
import { addCartItemInput, cartQuery, listingIdParams, updateCartItemInput, type Destination } from '../../shared/schemas/orders';
import { publicRoute } from '../auth/require-role';
import { notFound } from '../errors';
import { parseBody, parseParams, parseQuery } from '../lib/validate';
import * as cart from '../services/cart';

/** The cart works signed in or not (an anonymous cart lives behind a cookie until sign-in merges it). */
export const cartRouter = Router();

function destinationFrom(req: Request): Destination | null {
  const q = parseQuery(cartQuery, req);
  if (q.pickup === '1' || q.pickup === 'true') return { pickup: true };
  return q.country ? { country: q.country } : null;
}

cartRouter.get('/', publicRoute, async (req, res) => {
  const destination = destinationFrom(req);
  res.json(await cart.viewCart(cart.cartOwner(req, res, false), destination));
});

cartRouter.post('/items', publicRoute, async (req, res) => {
  const destination = destinationFrom(req);
  const { listingId, quantity } = parseBody(addCartItemInput, req);
  const owner = cart.cartOwner(req, res, true) as cart.CartOwner;
  const warnings = await cart.addItem(owner, listingId, quantity);
  res.status(201).json(await cart.viewCart(owner, destination, warnings));
});

cartRouter.patch('/items/:listingId', publicRoute, async (req, res) => {
  const destination = destinationFrom(req);
  const { listingId } = parseParams(listingIdParams, req);
  const { quantity } = parseBody(updateCartItemInput, req);
  const owner = cart.cartOwner(req, res, false);
  if (!owner) throw notFound('Cart item');
  const warnings = await cart.setItemQuantity(owner, listingId, quantity);
  res.json(await cart.viewCart(owner, destination, warnings));
});

cartRouter.delete('/items/:listingId', publicRoute, async (req, res) => {
  const destination = destinationFrom(req);
  const { listingId } = parseParams(listingIdParams, req);
  const owner = cart.cartOwner(req, res, false);
  if (!owner) throw notFound('Cart item');
  await cart.removeItem(owner, listingId);
  res.json(await cart.viewCart(owner, destination));
});
