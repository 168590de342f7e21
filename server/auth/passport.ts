import type { Request } from 'express';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { DataSource } from 'typeorm';
import { UserEntity } from '../db/entities/user.entity';
import { toSignedInUser } from '../services/users';
import { hashPassword, verifyPassword } from './passwords';

/** What a session keeps of its sign-in. */
interface SignIn {
  id: number;
  epoch: number;
}

// Checked when the e-mail is unknown, so a wrong e-mail and a wrong password take the same time.
let decoyHash: Promise<string> | undefined;
const decoy = () => (decoyHash ??= hashPassword('not-a-real-password-decoy'));

export function configurePassport(dataSource: DataSource): passport.PassportStatic {
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
  // A disabled or deleted user's sessions, and those from before a password reset, stop working on their next request.
  instance.deserializeUser((stored: SignIn | number, done) => {
    const { id, epoch } = typeof stored === 'number' ? { id: stored, epoch: 0 } : stored;
    users
      .findOneBy({ id })
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
