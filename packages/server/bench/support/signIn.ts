/** Signs in over HTTP as a browser would and returns the cookie header to send afterwards. */
export async function signIn(url: string, email: string, password: string, headers: Record<string, string> = {}): Promise<string> {
  const jar = new Map<string, string>();
  const keep = (response: Response): void => {
    for (const line of response.headers.getSetCookie()) {
      const pair = line.split(';')[0] ?? '';
      const at = pair.indexOf('=');
      if (at > 0) jar.set(pair.slice(0, at), pair.slice(at + 1));
    }
  };
  const cookie = (): string => [...jar].map(([key, value]) => `${key}=${value}`).join('; ');
  const csrf = await fetch(`${url}/api/auth/csrf`, { headers });
  keep(csrf);
  const { token } = (await csrf.json()) as { token: string };
  const response = await fetch(`${url}/api/auth/signin`, {
    method: 'POST',
    headers: { ...headers, 'content-type': 'application/json', 'x-csrf-token': token, cookie: cookie(), origin: url },
    body: JSON.stringify({ email, password }),
  });
  keep(response);
  if (response.status !== 200) throw new Error(`sign-in answered ${response.status}: ${await response.text()}`);
  return cookie();
}
