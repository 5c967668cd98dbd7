import { Router } from 'express';
import { signedRequest } from '../auth/require-role';
import { handleStripeWebhook } from '../services/stripe-webhooks';

/** Stripe's deliveries: no session, no Origin; the signature on the raw body is the authentication. */
export const webhooksRouter = Router();

webhooksRouter.post('/', signedRequest, async (req, res) => {
  const signature = req.headers['stripe-signature'];
  res.json(await handleStripeWebhook(req.body, typeof signature === 'string' ? signature : undefined));
});
