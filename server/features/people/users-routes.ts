import { Router } from 'express';
import { allow, currentUser } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { idParamSchema } from '../../../shared/schemas/common';
import { adminUserUpdateSchema } from '../../../shared/schemas/accounts';
import { presentAdminUser } from './presenters';
import { getUser, listUsers, updateUser } from './users';

/** Mounted at /api/admin/users: the group's people, their roles and status. */
export const adminUsersRouter = Router();

adminUsersRouter.get(
  '/',
  allow('admin'),
  handle({}, async (_input, _req, res) => {
    const users = await listUsers();
    res.set('Cache-Control', 'no-store').json({ items: users.map(presentAdminUser), total: users.length });
  }),
);

adminUsersRouter.get(
  '/:id',
  allow('admin'),
  handle({ params: idParamSchema }, async ({ params }, _req, res) => {
    res.json(presentAdminUser(await getUser(params.id)));
  }),
);

adminUsersRouter.patch(
  '/:id',
  allow('admin'),
  handle({ params: idParamSchema, body: adminUserUpdateSchema }, async ({ params, body }, req, res) => {
    res.json(presentAdminUser(await updateUser(currentUser(req), params.id, body)));
  }),
);
