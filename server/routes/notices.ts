import { Router } from 'express';
import { noticeParams, noticesQuery } from '../../shared/schemas/garage';
import { requireUser } from '../auth/require-role';
import { parseParams, parseQuery } from '../lib/validate';
import * as notices from '../services/notices';

/** The signed-in user's in-app notices. */
export const noticesRouter = Router();

noticesRouter.get('/', requireUser, async (req, res) => {
  const q = parseQuery(noticesQuery, req);
  res.json(await notices.listNotices(req.user!.id, { unreadOnly: q.unread === '1' || q.unread === 'true', limit: q.limit }));
});

// Declared before /:id/read so "read-all" is not read as an id.
noticesRouter.post('/read-all', requireUser, async (req, res) => {
  res.json(await notices.markAllRead(req.user!.id));
});

noticesRouter.post('/:id/read', requireUser, async (req, res) => {
  res.json({ notice: await notices.markRead(req.user!.id, parseParams(noticeParams, req).id) });
});
