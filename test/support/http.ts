// Helpers for end-to-end tests that drive a running Linkloom over HTTP: a signed-in client, and waiting for the
// background work (imports, runs, the nightly job) to finish. Zips of Markdown come from zip.ts.
export interface ApiAnswer {
  status: number;
  body: any; // eslint-disable-line @typescript-eslint/no-explicit-any -- each test reads the fields it checks
  headers: Headers;
}

/** Polls outside a test body too (expect.poll works only inside one). */
export async function waitFor(check: () => Promise<boolean>, timeoutMs: number, what: string): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`Timed out waiting for ${what}`);
}

/** A client signed in as a demo user; JSON bodies are sent as JSON, anything else as it is. */
export async function signedInClient(baseUrl: string, email: string, password = 'linkloom-demo') {
  const signIn = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (!signIn.ok) throw new Error(`sign-in as ${email} failed: ${signIn.status}`);
  const { accessToken } = (await signIn.json()) as { accessToken: string };
  return async (path: string, init: RequestInit & { json?: unknown } = {}): Promise<ApiAnswer> => {
    const { json, ...rest } = init;
    const response = await fetch(`${baseUrl}/api${path}`, {
      ...rest,
      body: json === undefined ? rest.body : JSON.stringify(json),
      headers: {
        Authorization: `Bearer ${accessToken}`,
        ...(json === undefined ? {} : { 'Content-Type': 'application/json' }),
        ...(rest.headers ?? {}),
      },
    });
    const text = await response.text();
    return { status: response.status, body: text ? JSON.parse(text) : undefined, headers: response.headers };
  };
}

export type Client = Awaited<ReturnType<typeof signedInClient>>;
