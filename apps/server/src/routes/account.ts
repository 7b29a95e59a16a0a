import { Router } from 'express';
import { profileUpdateSchema } from '@vatside/contracts/account';
import { requireUser } from '../auth/authorize.ts';
import type { AppDeps } from '../deps.ts';
import { parseInput } from '../http/validate.ts';
import { me, updateProfile } from '../services/account.ts';

export function accountRouter({ database }: AppDeps): Router {
  const router = Router();
  router.get('/me', async (req, res) => {
    res.json(req.user ? await me(database.db, req.user.id) : null);
  });
  router.patch('/me/profile', async (req, res) => {
    const person = requireUser(req);
    const changes = parseInput(profileUpdateSchema, req.body, 'profile');
    res.json(await updateProfile(database.db, person.id, changes));
  });
  return router;
}
