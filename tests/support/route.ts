import { NextRequest } from "next/server";

const ORIGIN = "http://localhost:3000";

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

/** Calls a route handler the way Next does, with a same-origin request unless told otherwise. */
export async function call<J = Record<string, unknown>>(handler: Handler, init: { method?: string; path?: string; params?: Record<string, string>; body?: unknown; headers?: Record<string, string> } = {}) {
  const method = init.method ?? "GET";
  const headers: Record<string, string> = { host: "localhost:3000", ...init.headers };
  if (method !== "GET") headers.origin ??= ORIGIN;
  if (init.body !== undefined) headers["content-type"] ??= "application/json";
  const req = new NextRequest(`${ORIGIN}${init.path ?? "/"}`, {
    method,
    headers,
    body: init.body === undefined ? undefined : typeof init.body === "string" ? init.body : JSON.stringify(init.body),
  });
  const res = await handler(req, { params: Promise.resolve(init.params ?? {}) });
  const text = await res.text();
  let json = {} as J;
  try {
    json = text ? JSON.parse(text) : ({} as J);
  } catch {
    // not JSON
  }
  return { status: res.status, json, headers: res.headers };
}

export function form(values: Record<string, string | number | undefined>) {
  const fd = new FormData();
  for (const [k, v] of Object.entries(values)) if (v !== undefined) fd.set(k, String(v));
  return fd;
}
