import { Router } from 'express';
import { checkoutInput } from '../../shared/schemas/orders';
import { requireUser } from '../auth/require-role';
import { parseBody } from '../lib/validate';
import { startCheckout } from '../services/checkout';

export const checkoutRouter = Router();

/** Reserves the cart's stock and opens one Stripe Checkout Session for it: {orderId, url}. */
checkoutRouter.post('/', requireUser, async (req, res) => {
  const { destination } = parseBody(checkoutInput, req);
  res.status(201).json(await startCheckout(req.user!, destination));
});
