import type { Request } from 'express';
import { csrfToken } from '../http/middleware/csrf';
import type { SessionUser } from '../../shared/schemas/auth';
import { User } from '../db/models';

/** Regenerates the session at sign-in (no fixation), keeps a fresh CSRF token in it and stamps the sign-in. */
export async function signIn(req: Request, user: SessionUser): Promise<string> {
  const before = await User.findByPk(user.id, { attributes: ['lastSignInAt'] });
  await new Promise<void>((resolve, reject) => {
    req.session.regenerate((err) => {
      if (err) return reject(err);
      req.login(user, (loginErr) => {
        if (loginErr) return reject(loginErr);
        req.session.signedInAt = Date.now();
        req.session.firstSignIn = !before?.lastSignInAt;
        csrfToken(req);
        req.session.save((saveErr) => (saveErr ? reject(saveErr) : resolve()));
      });
    });
  });
  await User.update({ lastSignInAt: new Date() }, { where: { id: user.id } });
  return req.session.csrfToken!;
}
