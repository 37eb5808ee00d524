// GET /api/health → {ok, db}: answers 503 when the database does not answer.
import { Router } from 'express';
import type { AppDeps } from '../../app-deps';

export function healthRouter(deps: AppDeps): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    try {
      await deps.dataSource.query('SELECT 1');
      res.json({ ok: true, db: 'up' });
    } catch (err) {
      deps.logger.warn({ err }, 'health check: database not answering');
      res.status(503).json({ ok: false, db: 'down' });
    }
  });
  return router;
}
