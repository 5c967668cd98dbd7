import { Router } from 'express';
import { searchQuery, suggestQuery } from '../../shared/schemas/search';
import { publicRoute } from '../auth/require-role';
import { parseQuery } from '../lib/validate';
import { searchShared, suggestShared } from '../services/search';

export const searchRouter = Router();

searchRouter.get('/', publicRoute, async (req, res) => {
  res.json(await searchShared(parseQuery(searchQuery, req)));
});

searchRouter.get('/suggest', publicRoute, async (req, res) => {
  res.json(await suggestShared(parseQuery(suggestQuery, req).q));
});
