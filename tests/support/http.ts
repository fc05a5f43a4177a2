/**
 * Signs in over plain HTTP the way a browser form does (CSRF token, then the credentials
 * callback) and returns the cookie header to send with later requests.
 */
export async function signInCookie(baseURL: string, email: string, password: string): Promise<string | null> {
  const csrfRes = await fetch(`${baseURL}/api/auth/csrf`);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const eq = pair.indexOf("=");
      jar.set(pair.slice(0, eq), pair.slice(eq + 1));
    }
  };
  keep(csrfRes);
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const res = await fetch(`${baseURL}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookie() },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  keep(res);
  return [...jar.keys()].some((k) => k.includes("session-token")) ? cookie() : null;
}
