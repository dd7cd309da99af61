import { Router } from 'express';
import { sql } from 'drizzle-orm';
import type { AppContext } from '../../config/context';

export function healthRouter({ db }: AppContext) {
  const router = Router();
  router.get('/api/health', async (_req, res) => {
    try {
      await db.execute(sql`select 1`);
      res.json({ status: 'ok', database: 'ok' });
    } catch {
      res.status(503).json({ status: 'unavailable', database: 'unreachable' });
    }
  });
  return router;
}
