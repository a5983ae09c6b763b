import { Router } from 'express';
import type { Sequelize } from 'sequelize';

export function healthRoutes(sequelize: Sequelize): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    try {
      await sequelize.query('SELECT 1');
      res.json({ ok: true, db: 'up' });
    } catch {
      res.status(503).json({ ok: false, db: 'down' });
    }
  });
  return router;
}
