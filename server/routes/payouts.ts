import { Router } from 'express';
import { statementQuery } from '../../shared/schemas/orders';
import { requireRole } from '../auth/require-role';
import { parseQuery } from '../lib/validate';
import { payoutState, recentTransfers, startOnboarding } from '../services/payouts';
import { monthlyStatement, statementCsv } from '../services/statements';

/** Mounted at /seller: payout onboarding and monthly statements. */
export const sellerPayoutsRouter = Router();

sellerPayoutsRouter.get('/payouts', requireRole('seller'), async (req, res) => {
  res.json({ payouts: await payoutState(req.user!), recentTransfers: await recentTransfers(req.user!.id) });
});

sellerPayoutsRouter.post('/payouts/onboarding', requireRole('seller'), async (req, res) => {
  res.json(await startOnboarding(req.user!));
});

sellerPayoutsRouter.get('/statements', requireRole('seller'), async (req, res) => {
  const { month, format } = parseQuery(statementQuery, req);
  const statement = await monthlyStatement(req.user!.id, month);
  if (format === 'csv') {
    res.type('text/csv; charset=utf-8');
    res.attachment(`drabyard-statement-${month}.csv`);
    res.send(statementCsv(statement));
    return;
  }
  res.json({ statement });
});
