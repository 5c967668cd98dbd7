import { Router } from 'express';
import { alertsRouter } from './alerts';
import { garageRouter } from './garage';
import { noticesRouter } from './notices';
import { authRouter } from './auth';
import { cartRouter } from './cart';
import { checkoutRouter } from './checkout';
import { adminOrdersRouter, ordersRouter } from './orders';
import { sellerPayoutsRouter } from './payouts';
import { sellerOrdersRouter } from './seller-orders';
import { webhooksRouter } from './webhooks';
import { docsRouter } from './docs';
import { adminListingsRouter } from './admin-listings';
import { adminCatalogRouter, catalogRouter } from './catalog';
import { healthRouter } from './health';
import { searchRouter } from './search';
import { listingsRouter, myListingsRouter } from './listings';
import { sellerRouter } from './seller';
import { adminSellerApplicationsRouter, sellerApplicationsRouter } from './seller-applications';

/**
 * The router table: every API router is mounted from this list (the authorisation matrix and the API
 * documentation walk it). ADD NEW ROUTERS AS ENTRIES OF `mounts` (one line each); the catch-all '/' catalog
 * router is mounted last, from `tail`.
 */
export const mounts: Array<readonly [string, Router]> = [
  ['/health', healthRouter],
  ['/', docsRouter],
  ['/auth', authRouter],
  ['/seller-applications', sellerApplicationsRouter],
  ['/admin/seller-applications', adminSellerApplicationsRouter],
  ['/admin', adminCatalogRouter],
  ['/listings', listingsRouter],
  ['/me/listings', myListingsRouter],
  ['/me', sellerRouter],
  ['/admin/listings', adminListingsRouter],
  ['/garage', garageRouter],
  ['/alerts', alertsRouter],
  ['/notices', noticesRouter],
  ['/cart', cartRouter],
  ['/checkout', checkoutRouter],
  ['/orders', ordersRouter],
  ['/seller/orders', sellerOrdersRouter],
  ['/seller', sellerPayoutsRouter],
  ['/admin/orders', adminOrdersRouter],
  ['/webhooks/stripe', webhooksRouter],
  ['/search', searchRouter],
];

/** Routers mounted last, after every helper's entries above. */
const tail: Array<readonly [string, Router]> = [['/', catalogRouter]];

export const apiRouter = Router();
export function allMounts() {
  return [...mounts, ...tail];
}
for (const [prefix, router] of allMounts()) apiRouter.use(prefix, router);
