/** Talks to a running Linkloom over HTTP as a demo user. */
export async function apiAs(baseUrl: string, email: string) {
  const response = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: 'linkloom-demo' }),
  });
  if (!response.ok) throw new Error(`sign-in as ${email} failed: ${response.status}`);
  const { accessToken } = (await response.json()) as { accessToken: string };
  return async <T = any>(path: string): Promise<T> => {
    const r = await fetch(`${baseUrl}${path}`, { headers: { authorization: `Bearer ${accessToken}` } });
    if (!r.ok) throw new Error(`GET ${path}: ${r.status} ${await r.text()}`);
    return (await r.json()) as T;
  };
}

/** Waits until the demo doc set has its three snapshots imported and analysed (the first start does it in the background). */
export async function waitForDemo(baseUrl: string, timeoutMs = 420_000): Promise<{ docSetId: string; runId: string }> {
  const get = await apiAs(baseUrl, 'admin@demo.linkloom.test');
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const docSets = await get<{ items: { id: string; name: string }[] }>('/api/doc-sets');
    const demo = docSets.items[0];
    if (demo) {
      const runs = await get<{ items: { id: string; status: string }[] }>(`/api/doc-sets/${demo.id}/runs?pageSize=10`);
      const finished = runs.items.filter((r) => r.status === 'finished');
      const snapshots = await get<{ items: { status: string }[] }>(`/api/doc-sets/${demo.id}/snapshots`);
      const busy =
        snapshots.items.some((s) => s.status === 'importing' || s.status === 'received') ||
        runs.items.some((r) => r.status === 'queued' || r.status === 'running');
      if (finished.length >= 3 && !busy) return { docSetId: demo.id, runId: finished[0].id };
    }
    if (Date.now() > deadline) throw new Error('the demo doc set was not ready in time');
    await new Promise((r) => setTimeout(r, 2_000));
  }
}
