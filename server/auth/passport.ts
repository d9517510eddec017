import type { IncomingMessage } from 'node:http';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { User } from '../db/models';
import { dummyHash, verifyPassword } from './passwords';
import { sessionUserRow } from './user-cache';
import type { SessionUser } from '../../shared/schemas/auth';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type -- declaration merging with passport's User
    interface User extends SessionUser {}
  }
}

declare module 'express-session' {
  interface SessionData {
    signedInAt?: number;
    /** This session began the account's first sign-in ever (the home page then says "Welcome", not "Welcome back"). */
    firstSignIn?: boolean;
  }
}

passport.use(
  new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, async (email, password, done) => {
    try {
      const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
      const ok = await verifyPassword(password, user?.passwordHash ?? dummyHash);
      if (!user || !ok) return done(null, false);
      // Only someone who knows the password learns that the account is disabled.
      if (user.status !== 'active') return done(null, false, { message: 'disabled' });
      done(null, toSessionUser(user));
    } catch (err) {
      done(err);
    }
  }),
);

passport.serializeUser((user, done) => done(null, user.id));

/**
 * A session is honoured only for an active user who signed in after their sessions were last ended. The user
 * row comes from a short-lived cache (auth/user-cache.ts), so a signed-in read costs no extra query.
 */
passport.deserializeUser<number, IncomingMessage>(async (req, id, done) => {
  try {
    const user = await sessionUserRow(id, req);
    const signedInAt = (req as { session?: { signedInAt?: number } }).session?.signedInAt ?? 0;
    const current = user && user.status === 'active' && signedInAt >= user.sessionsValidAfter.getTime();
    done(null, current ? toSessionUser(user) : false);
  } catch (err) {
    done(err);
  }
});

export function toSessionUser(user: Pick<User, 'id' | 'email' | 'name' | 'role'>): SessionUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}

export { passport };
