import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { DataSource } from 'typeorm';
import { UserEntity } from '../db/entities/user.entity';
import { toSignedInUser } from '../services/users';
import { hashPassword, verifyPassword } from './passwords';


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
  instance.serializeUser((user, done) => done(null, user.id));
  // A disabled or deleted user's sessions stop working on their next request.
  instance.deserializeUser((id: number, done) => {
    users
      .findOneBy({ id })
      .then((user) => done(null, user && !user.disabled ? toSignedInUser(user) : false))
      .catch(done);
  });
  return instance as unknown as passport.PassportStatic;
}
