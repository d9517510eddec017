import { Router } from 'express';
import { allow } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { resetRequestsByAddress } from '../../http/middleware/throttle';
import { passwordResetRequestSchema, passwordResetSchema, tokenParamSchema } from '../../../shared/schemas/auth';
import { completePasswordReset, previewPasswordReset, requestPasswordReset } from './password-resets';
import { logger } from '../../http/logger';

/** Mounted at /api/auth/password-reset. */
export const passwordResetRouter = Router();

/** The same 202 whether or not the address has an account: the lookup and the e-mail happen after the answer. */
passwordResetRouter.post(
  '/',
  allow('public'),
  resetRequestsByAddress,
  handle({ body: passwordResetRequestSchema }, async ({ body }, _req, res) => {
    res.status(202).json({
      message: 'If that address has an account, a link to set a new password is on its way. It works for one hour.',
    });
    requestPasswordReset(body.email).catch((err) => logger.error({ err }, 'password reset mail failed'));
  }),
);

passwordResetRouter.get(
  '/:token',
  allow('public'),
  handle({ params: tokenParamSchema }, async ({ params }, _req, res) => {
    res.set('Cache-Control', 'no-store').json(await previewPasswordReset(params.token));
  }),
);

passwordResetRouter.post(
  '/:token',
  allow('public'),
  handle({ params: tokenParamSchema, body: passwordResetSchema }, async ({ params, body }, _req, res) => {
    await completePasswordReset(params.token, body.password);
    res.status(204).end();
  }),
);
