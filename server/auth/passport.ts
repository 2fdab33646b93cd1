import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { Db } from '../db/knex';
import { findCredentials, findPerson } from '../people/people.repo';
import { DUMMY_HASH, verifyPassword } from './password';

export function configurePassport(db: Db): passport.Authenticator {
  const instance = new passport.Passport();
  instance.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, async (email, password, done) => {
      try {
        const found = await findCredentials(db, email);
        const ok = await verifyPassword(password, found?.passwordHash ?? DUMMY_HASH);
        if (!found || !ok || found.person.status !== 'active') return done(null, false);
        return done(null, {
          id: found.person.id,
          email: found.person.email,
          name: found.person.name,
          role: found.person.role,
          status: found.person.status,
        });
      } catch (err) {
        return done(err);
      }
    }),
  );
  instance.serializeUser((user, done) => done(null, user.id));
  // Looked up on every request, so a role change or deactivation applies at once.
  instance.deserializeUser(async (id: number, done) => {
    try {
      const person = await findPerson(db, id);
      if (!person || person.status !== 'active') return done(null, false);
      done(null, { id: person.id, email: person.email, name: person.name, role: person.role, status: person.status });
    } catch (err) {
      done(err);
    }
  });
  return instance;
}
