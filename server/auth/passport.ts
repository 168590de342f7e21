import type { Request } from 'express';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { DataSource } from 'typeorm';
import { UserEntity } from '../db/entities/user.entity';
import { toSignedInUser } from '../services/users';
import { hashPassword, verifyPassword } from './passwords';
import type { SignInCache } from './sign-in-cache';

/** What a session keeps of its sign-in. */
interface SignIn {
  id: number;
  epoch: number;
}

// Checked when the e-mail is unknown, so a wrong e-mail and a wrong password take the same time.
let decoyHash: Promise<string> | undefined;
const decoy = () => (decoyHash ??= hashPassword('not-a-real-password-decoy'));

export function configurePassport(dataSource: DataSource, cache: SignInCache): passport.PassportStatic {
  const instance = new passport.Passport();
  const users = dataSource.getRepository(UserEntity);
  instance.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      users
        .findOneBy({ email: email.trim().toLowerCase() })
        .then(async (user) => {
          const ok = await verifyPassword(user?.passwordHash ?? (await decoy()), password);
          if (!user || !ok || user.disabled) return done(null, false);
          return done(null, toSignedInUser(user));
        })
        .catch(done);
    }),
  );
  // A sign-in remembers the user's session epoch; a password reset raises it and so ends it.
  instance.serializeUser((user, done) => {
    users
      .findOneBy({ id: user.id })
      .then((row) => done(null, { id: user.id, epoch: row?.sessionEpoch ?? 0 } satisfies SignIn))
      .catch(done);
  });
  // The user as stored, through the sign-in cache (cleared on every instance when the user changes).
  const userById = async (id: number) => {
    const held = cache.users.get(id);
    if (held) return held;
    const stamp = cache.users.stamp();
    const user = await users.findOneBy({ id });
    if (user) cache.users.setRead(id, user, stamp);
    return user;
  };
  // A disabled or deleted user's sessions, and those from before a password reset, stop working on their next request.
  instance.deserializeUser((stored: SignIn | number, done) => {
    const { id, epoch } = typeof stored === 'number' ? { id: stored, epoch: 0 } : stored;
    userById(id)
      .then((user) => done(null, user && !user.disabled && user.sessionEpoch === epoch ? toSignedInUser(user) : false))
      .catch(done);
  });
  return instance as unknown as passport.PassportStatic;
}

/** Signs the request's user in again under their current session epoch: their own password change keeps this sign-in. */
export function renewSignIn(req: Request): Promise<void> {
  const user = req.user;
  if (!user) return Promise.resolve();
  return new Promise((resolve, reject) => req.logIn(user, { session: true, keepSessionInfo: true }, (error) => (error ? reject(error) : resolve())));
}
