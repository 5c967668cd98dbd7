import { Router } from 'express';
import { sellerOrdersQuery, shipInput, subOrderIdParams } from '../../shared/schemas/orders';
import { requireRole } from '../auth/require-role';
import { parseBody, parseParams, parseQuery } from '../lib/validate';
import * as orders from '../services/orders';

/** A seller's own sub-orders only; another seller's id answers 404. */
export const sellerOrdersRouter = Router();

sellerOrdersRouter.get('/', requireRole('seller'), async (req, res) => {
  const { state } = parseQuery(sellerOrdersQuery, req);
  res.json({ subOrders: await orders.listSellerSubOrders(req.user!.id, state) });
});

sellerOrdersRouter.get('/:subOrderId', requireRole('seller'), async (req, res) => {
  const { subOrderId } = parseParams(subOrderIdParams, req);
  res.json({ subOrder: await orders.getSellerSubOrder(req.user!.id, subOrderId) });
});

sellerOrdersRouter.post('/:subOrderId/ship', requireRole('seller'), async (req, res) => {
  const { subOrderId } = parseParams(subOrderIdParams, req);
  res.json({ subOrder: await orders.markShipped(req.user!, subOrderId, parseBody(shipInput, req)) });
});

sellerOrdersRouter.post('/:subOrderId/deliver', requireRole('seller'), async (req, res) => {
  const { subOrderId } = parseParams(subOrderIdParams, req);
  res.json({ subOrder: await orders.markDelivered(req.user!, subOrderId) });
});
