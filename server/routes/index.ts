import { Router } from 'express';
import { authRouter } from './auth';
import { docsRouter } from './docs';
import { adminListingsRouter } from './admin-listings';
import { adminCatalogRouter, catalogRouter } from './catalog';
import { healthRouter } from './health';
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
];

/** Routers mounted last, after every helper's entries above. */
const tail: Array<readonly [string, Router]> = [['/', catalogRouter]];

export const apiRouter = Router();
export function allMounts() {
  return [...mounts, ...tail];
}
for (const [prefix, router] of allMounts()) apiRouter.use(prefix, router);
