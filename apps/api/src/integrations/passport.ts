import passport from 'passport';
import { Strategy as GoogleStrategy, type Profile } from 'passport-google-oauth20';
import type { Config } from '../config/env.js';
import type { Request } from 'express';
import { findMe, signIn } from '../services/users/users.js';
import { userLoadedWithSession } from './session-store.js';

/** Google sign-in through passport, pointed by configuration at the provider (or its local stand-in). */
export function configurePassport(config: Config) {
  const base = config.OAUTH_URL.replace(/\/$/, '');
  passport.use(
    new GoogleStrategy(
      {
        clientID: config.OAUTH_CLIENT_ID,
        clientSecret: config.OAUTH_CLIENT_SECRET,
        callbackURL: `${config.publicUrl}/auth/google/callback`,
        authorizationURL: `${base}/authorize`,
        tokenURL: `${base}/token`,
        userProfileURL: `${base}/userinfo`,
        state: true,
        pkce: true,
      },
      (_accessToken: string, _refreshToken: string, profile: Profile, done: (err: unknown, user?: Express.User | false) => void) => {
        const json = profile._json as { email?: string; email_verified?: boolean | string; name?: string };
        const email = json.email ?? profile.emails?.[0]?.value;
        if (!email) return done(null, false);
        signIn(
          {
            sub: profile.id,
            email,
            emailVerified: json.email_verified === true || json.email_verified === 'true',
            name: json.name ?? profile.displayName ?? '',
          },
          config.publicUrl,
        ).then(
          (user) => done(null, user),
          (err) => done(err),
        );
      },
    ),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  // the session store has usually read the user with the session (one statement for both)
  passport.deserializeUser((req: Request, id: string, done: (err: unknown, user?: Express.User | false) => void) => {
    const loaded = userLoadedWithSession(req, id);
    if (loaded) return done(null, loaded);
    findMe(id).then(
      (user) => done(null, user ?? false),
      (err) => done(err),
    );
  });
  return passport;
}
