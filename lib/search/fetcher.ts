/** The SWR fetcher for our JSON routes: throws on any non-2xx answer, with the server's message. */
export async function fetchJson<T>(url: string): Promise<T> {
  const response = await fetch(url, { credentials: "same-origin", headers: { accept: "application/json" } });
  if (!response.ok) {
    const body = (await response.json().catch(() => null)) as { error?: string } | null;
    throw new Error(body?.error ?? `The server answered ${response.status}.`);
  }
  return (await response.json()) as T;
}
