import { Router } from 'express';

import { createUserSchema, updateUserSchema } from '@polecourt/contracts';

import { currentUser, requireRole } from '../../lib/auth-middleware.js';
import { parseId, parsePage } from '../../lib/pagination.js';
import { validate } from '../../lib/validate.js';
import { createUser, listUsers, updateUser } from './use-cases.js';

export function userRoutes(): Router {
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/', async (req, res) => {
    const { limit, offset } = parsePage(req.query);
    res.json(await listUsers(limit, offset));
  });

  router.post('/', async (req, res) => {
    const input = validate(createUserSchema, req.body);
    res.status(201).json(await createUser(currentUser(req), input));
  });

  router.patch('/:id', async (req, res) => {
    const id = parseId(req.params.id, 'That user');
    const changes = validate(updateUserSchema, req.body);
    res.json(await updateUser(currentUser(req), id, changes));
  });

  return router;
}
