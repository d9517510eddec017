import { Router, type RequestHandler } from 'express';
import { allow, currentUser } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { ForbiddenError } from '../../http/errors';
import { idParamSchema } from '../../../shared/schemas/common';
import { tokenCreateSchema } from '../../../shared/schemas/tokens';
import { createToken, listTokens, revokeToken } from './service';

/** The caller's personal API tokens (for scripts): create, list, revoke. */
export const tokensRouter = Router();

tokensRouter.get(
  '/',
  allow('viewer'),
  handle({}, async (_input, req, res) => {
    res.json({ items: await listTokens(currentUser(req).id) });
  }),
);

/** A token cannot mint tokens: a leaked or expiring token must not be able to outlive itself. */
const sessionOnly: RequestHandler = (req, _res, next) =>
  next(
    req.apiToken
      ? new ForbiddenError('Create API tokens from a signed-in session (the profile page), not with a token.')
      : undefined,
  );

tokensRouter.post(
  '/',
  allow('viewer'),
  sessionOnly,
  handle({ body: tokenCreateSchema }, async ({ body }, req, res) => {
    res.status(201).json(await createToken(currentUser(req), body));
  }),
);

tokensRouter.delete(
  '/:id',
  allow('viewer'),
  handle({ params: idParamSchema }, async ({ params }, req, res) => {
    res.json(await revokeToken(currentUser(req), params.id));
  }),
);

/** Every token of the group, for admins (who may revoke any of them through DELETE /api/tokens/:id). */
export const adminTokensRouter = Router();

adminTokensRouter.get(
  '/',
  allow('admin'),
  handle({}, async (_input, _req, res) => {
    res.json({ items: await listTokens() });
  }),
);
