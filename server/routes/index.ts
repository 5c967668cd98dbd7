import { Router } from 'express';
import { authRouter } from './auth';
import { adminCatalogRouter, catalogRouter } from './catalog';
import { healthRouter } from './health';
import { adminSellerApplicationsRouter, sellerApplicationsRouter } from './seller-applications';

/** The router table: every API route is mounted here (the authorisation matrix walks it). */
export const apiRouter = Router();
apiRouter.use('/health', healthRouter);
apiRouter.use('/auth', authRouter);
apiRouter.use('/seller-applications', sellerApplicationsRouter);
apiRouter.use('/admin/seller-applications', adminSellerApplicationsRouter);
apiRouter.use('/admin', adminCatalogRouter);
apiRouter.use('/', catalogRouter);
