import { Router } from 'express';
import { sessionCookieName } from '../../security/session';
import { callbackPath, type PassportInstance } from '../../security/passport';

export function authRouter(passport: PassportInstance) {
  const router = Router();
  router.get('/auth/google', passport.authenticate('google', { prompt: 'select_account' } as object));
  router.get(callbackPath, (req, res, next) => {
    passport.authenticate('google', (error: unknown, user: Express.User | false, info?: { message?: string }) => {
      if (error) {
        // A provider that fails mid-way is not the person's fault: tell them on the sign-in page, keep the detail in the log.
        req.log.warn({ err: error }, 'sign-in callback failed');
        return res.redirect(
          `/sign-in?error=${encodeURIComponent('The sign-in provider did not confirm who you are. Please try again.')}`,
        );
      }
      if (!user) {
        const reason = info?.message ?? 'Sign-in was cancelled or did not finish.';
        return res.redirect(`/sign-in?error=${encodeURIComponent(reason)}`);
      }
      // req.login regenerates the session id, so a session fixed before sign-in is worthless afterwards.
      // The sign-in page sends a signed-in person on to their own start page.
      req.login(user, (loginError) => {
        if (loginError) return next(loginError);
        req.session.signedInAt = Date.now();
        // Saved before the redirect goes out: the browser follows it before the response's own save would land.
        req.session.save((saveError) => (saveError ? next(saveError) : res.redirect('/sign-in')));
      });
    })(req, res, next);
  });
  router.post('/auth/sign-out', (req, res, next) => {
    req.logout((error) => {
      if (error) return next(error);
      req.session.destroy(() => {
        res.clearCookie(sessionCookieName);
        res.status(204).end();
      });
    });
  });
  // Nobody signed in is an ordinary answer here, not a refusal: every signed-out page asks, and a 401 would
  // put an error on the browser's console each time. Every other address still answers 401 to a stranger.
  router.get('/api/me', (req, res) => {
    res.json({ user: req.user ?? null });
  });
  return router;
}
