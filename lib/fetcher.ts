/** An HTTP error from our own JSON API, with the server's message. */
export class FetchError extends Error {
  constructor(readonly status: number, message: string) {
    super(message);
    this.name = "FetchError";
  }
}

/** The SWR fetcher: JSON from a same-origin GET, throwing on any non-2xx answer. */
export async function fetcher<T>(url: string): Promise<T> {
  const response = await fetch(url, { headers: { accept: "application/json" }, credentials: "same-origin" });
  if (!response.ok) {
    let message = `The server answered ${response.status}.`;
    try {
      const body = (await response.json()) as { error?: string };
      if (body.error) message = body.error;
    } catch {}
    throw new FetchError(response.status, message);
  }
  return (await response.json()) as T;
}
