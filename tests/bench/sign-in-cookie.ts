/** The OAuth round trip with plain fetch, as a browser would make it, returning the session cookie at the end. */
export async function signInCookie(origin: string, email: string): Promise<string> {
  const cookieOf = (res: Response) =>
    res.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .join('; ');
  const start = await fetch(`${origin}/auth/google`, { redirect: 'manual' });
  const first = cookieOf(start);
  const authorize = new URL(start.headers.get('location') ?? '');
  authorize.searchParams.set('login_hint', email);
  const provider = await fetch(authorize, { redirect: 'manual' });
  const back = provider.headers.get('location');
  if (!back) throw new Error(`the provider did not send us back (${provider.status})`);
  const done = await fetch(back, { redirect: 'manual', headers: { cookie: first } });
  const session = cookieOf(done);
  if (done.status !== 302 || !session) throw new Error(`sign-in failed: ${done.status}`);
  const me = await fetch(`${origin}/api/me`, { headers: { cookie: session } });
  if (!me.ok) throw new Error(`signed in but /api/me answered ${me.status}`);
  return session;
}
