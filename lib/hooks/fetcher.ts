/** The one SWR fetcher: JSON in, `{ error, fields }` thrown as FetchError with its status. */
export class FetchError extends Error {
  constructor(
    public status: number,
    message: string,
    public body: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

export async function fetcher<T>(url: string): Promise<T> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  const body = await res.json().catch(() => ({}));
  if (!res.ok) throw new FetchError(res.status, (body as { error?: string }).error ?? `Request failed (${res.status}).`, body);
  return body as T;
}

export async function sendJson<T>(url: string, method: "POST" | "PATCH" | "PUT" | "DELETE", data?: unknown): Promise<T> {
  const res = await fetch(url, {
    method,
    headers: { "content-type": "application/json", accept: "application/json" },
    body: data === undefined ? undefined : JSON.stringify(data),
  });
  const body = await res.json().catch(() => ({}));
  if (!res.ok) throw new FetchError(res.status, (body as { error?: string }).error ?? `Request failed (${res.status}).`, body);
  return body as T;
}
