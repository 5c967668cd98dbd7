import { Router } from 'express';
import { z } from 'zod';
import { sellerApplicationDecisionInput, sellerApplicationInput, sellerApplicationStates } from '../../shared/schemas/auth';
import { requireRole, requireUser } from '../auth/require-role';
import { parseBody, parseParams, parseQuery } from '../lib/validate';
import * as applications from '../services/seller-applications';

export const sellerApplicationsRouter = Router();
export const adminSellerApplicationsRouter = Router();

sellerApplicationsRouter.post('/', requireUser, async (req, res) => {
  const application = await applications.apply(req.user!, parseBody(sellerApplicationInput, req));
  res.status(201).json({ application });
});

sellerApplicationsRouter.get('/mine', requireUser, async (req, res) => {
  res.json({ application: await applications.mine(req.user!.id) });
});

adminSellerApplicationsRouter.get('/', requireRole('admin'), async (req, res) => {
  const { state } = parseQuery(z.object({ state: z.enum(sellerApplicationStates).optional() }), req);
  res.json({ applications: await applications.list(state) });
});

adminSellerApplicationsRouter.post('/:id/decision', requireRole('admin'), async (req, res) => {
  const { id } = parseParams(z.object({ id: z.uuid() }), req);
  const { decision, note } = parseBody(sellerApplicationDecisionInput, req);
  res.json({ application: await applications.decide(req.user!, id, decision, note) });
});
