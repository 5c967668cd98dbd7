import { Router } from 'express';
import { orderIdParams, refundInput } from '../../shared/schemas/orders';
import { requireRole, requireUser } from '../auth/require-role';
import { parseBody, parseParams } from '../lib/validate';
import { cancelPendingCheckout } from '../services/checkout';
import * as orders from '../services/orders';

/** The buyer's orders (an administrator may read any order by id). */
export const ordersRouter = Router();
export const adminOrdersRouter = Router();

ordersRouter.get('/', requireUser, async (req, res) => {
  res.json({ orders: await orders.listBuyerOrders(req.user!.id) });
});

ordersRouter.get('/:id', requireUser, async (req, res) => {
  const { id } = parseParams(orderIdParams, req);
  res.json({ order: await orders.getOrderFor(req.user!, id) });
});

/** Back from the payment page without paying: the checkout is given up and its stock released. */
ordersRouter.post('/:id/cancel', requireUser, async (req, res) => {
  const { id } = parseParams(orderIdParams, req);
  await cancelPendingCheckout(req.user!, id);
  res.json({ order: await orders.getOrderFor(req.user!, id) });
});

adminOrdersRouter.post('/:id/refund', requireRole('admin'), async (req, res) => {
  const { id } = parseParams(orderIdParams, req);
  res.json({ order: await orders.refundOrder(req.user!, id, parseBody(refundInput, req)) });
});
