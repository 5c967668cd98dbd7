import { Router } from 'express';
import { alertParams, createAlertInput } from '../../shared/schemas/garage';
import { requireUser } from '../auth/require-role';
import { parseBody, parseParams } from '../lib/validate';
import * as alerts from '../services/wanted-alerts';

/** The signed-in user's wanted alerts. */
export const alertsRouter = Router();

alertsRouter.get('/', requireUser, async (req, res) => {
  res.json({ alerts: await alerts.listAlerts(req.user!.id) });
});

alertsRouter.post('/', requireUser, async (req, res) => {
  res.status(201).json({ alert: await alerts.createAlert(req.user!.id, parseBody(createAlertInput, req)) });
});

alertsRouter.delete('/:id', requireUser, async (req, res) => {
  await alerts.deleteAlert(req.user!.id, parseParams(alertParams, req).id);
  res.status(204).end();
});
