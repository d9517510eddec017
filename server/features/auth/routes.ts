import { Router, type Request } from 'express';
import { allow, currentUser } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { csrfToken } from '../../http/middleware/csrf';
import { passwordChangeByUser, signInWaits, whenAccountIsGuessed } from '../../http/middleware/throttle';
import { alertAccountOwner } from './guess-alert';
import { passport, toSessionUser } from '../../auth/passport';
import { signIn } from '../../auth/sign-in';
import { rememberDevice } from '../../auth/known-device';
import {
  loginInputSchema,
  passwordChangeSchema,
  profileUpdateSchema,
  type SessionUser,
} from '../../../shared/schemas/auth';
import { AppError } from '../../http/errors';
import { changePassword, updateProfileName, WrongPasswordError } from './profile';

export const authRouter = Router();
whenAccountIsGuessed(alertAccountOwner);

authRouter.get('/csrf', allow('public'), (req, res) => {
  res.set('Cache-Control', 'no-store').json({ token: csrfToken(req) });
});

authRouter.get('/me', allow('public'), (req, res) => {
  res
    .set('Cache-Control', 'no-store')
    .json({ user: req.user ?? null, firstSignIn: req.user ? !!req.session.firstSignIn : false });
});

function authenticate(req: Request): Promise<{ user: SessionUser | false; disabled: boolean }> {
  return new Promise((resolve, reject) => {
    passport.authenticate(
      'local',
      { session: false },
      (err: unknown, user: SessionUser | false, info?: { message?: string }) =>
        err ? reject(err) : resolve({ user, disabled: info?.message === 'disabled' }),
    )(req, req.res!, () => undefined);
  });
}

/** One generic answer for a wrong e-mail or password; failed attempts bring growing waits per address and per account. */
authRouter.post(
  '/login',
  allow('public'),
  signInWaits,
  handle({ body: loginInputSchema }, async (_input, req, res) => {
    const { user, disabled } = await authenticate(req);
    if (disabled)
      throw new AppError(
        403,
        'account_disabled',
        'This account is disabled. Ask your group’s admin to enable it again.',
      );
    if (!user) throw new AppError(401, 'invalid_credentials', 'Wrong e-mail or password.');
    const token = await signIn(req, user);
    rememberDevice(res, user.email);
    res.json({ user, csrfToken: token });
  }),
);

authRouter.post('/logout', allow('viewer'), (req, res, next) => {
  req.logout((err) => {
    if (err) return next(err);
    req.session.destroy((destroyErr) => {
      if (destroyErr) return next(destroyErr);
      res.clearCookie('rfolio.sid').status(204).end();
    });
  });
});

authRouter.patch(
  '/me',
  allow('viewer'),
  handle({ body: profileUpdateSchema }, async ({ body }, req, res) => {
    const user = await updateProfileName(currentUser(req).id, body.name);
    res.json({ user: toSessionUser(user) });
  }),
);

/** Current + new password; every other session of the person ends, this one stays signed in. */
authRouter.post(
  '/me/password',
  allow('viewer'),
  passwordChangeByUser,
  handle({ body: passwordChangeSchema }, async ({ body }, req, res) => {
    try {
      await changePassword(currentUser(req).id, body, req.sessionID);
    } catch (err) {
      if (err instanceof WrongPasswordError) res.locals.wrongPassword = true;
      throw err;
    }
    req.session.signedInAt = Date.now();
    await new Promise<void>((resolve, reject) => req.session.save((err) => (err ? reject(err) : resolve())));
    res.status(204).end();
  }),
);
