import { Router, type Request } from 'express';
import { allow } from '../middleware/access';
import { handle } from '../middleware/validate';
import { csrfToken } from '../middleware/csrf';
import { passport } from '../auth/passport';
import { loginInputSchema, type SessionUser } from '../../shared/schemas/auth';
import { AppError } from '../errors';
import { User } from '../models';

export const authRouter = Router();

authRouter.get('/csrf', allow('public'), (req, res) => {
  res.set('Cache-Control', 'no-store').json({ token: csrfToken(req) });
});

authRouter.get('/me', allow('public'), (req, res) => {
  res.set('Cache-Control', 'no-store').json({ user: req.user ?? null });
});

function authenticate(req: Request): Promise<SessionUser | false> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', { session: false }, (err: unknown, user: SessionUser | false) =>
      err ? reject(err) : resolve(user),
    )(req, req.res!, () => undefined);
  });
}

/** Regenerates the session at sign-in (no fixation) and keeps a fresh CSRF token in it. */
function signIn(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) => {
    req.session.regenerate((err) => {
      if (err) return reject(err);
      req.login(user, (loginErr) => {
        if (loginErr) return reject(loginErr);
        req.session.signedInAt = Date.now();
        csrfToken(req);
        req.session.save((saveErr) => (saveErr ? reject(saveErr) : resolve()));
      });
    });
  });
}

authRouter.post(
  '/login',
  allow('public'),
  handle({ body: loginInputSchema }, async (_input, req, res) => {
    const user = await authenticate(req);
    if (!user) throw new AppError(401, 'invalid_credentials', 'Wrong e-mail or password.');
    await signIn(req, user);
    await User.update({ lastSignInAt: new Date() }, { where: { id: user.id } });
    res.json({ user, csrfToken: req.session.csrfToken });
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
