import { ZodError } from "zod";
import { ApiError, validationError } from "./errors";

/** A JSON response. The web platform's own `Response.json`: no response sets cookies, so Next's wrapper would only add work. */
export function json<T>(body: T, init?: number | ResponseInit): Response {
  return Response.json(body, typeof init === "number" ? { status: init } : init);
}

/** Turns any thrown error into the API's JSON shape `{ error, fields? }`; unknown errors are logged as 500. */
export function errorResponse(err: unknown) {
  const e = err instanceof ZodError ? validationError(err) : err;
  if (e instanceof ApiError) {
    return json({ error: e.message, ...(e.fields ? { fields: e.fields } : {}), ...(e.extra ?? {}) }, e.status);
  }
  console.error(err);
  return json({ error: "Something went wrong on our side. Nothing was changed; please try again." }, 500);
}

export async function readJson(req: Request): Promise<unknown> {
  const type = req.headers.get("content-type") ?? "";
  if (!type.includes("application/json")) throw new ApiError(415, "Send the body as application/json.");
  try {
    return await req.json();
  } catch {
    throw new ApiError(400, "The request body is not valid JSON.");
  }
}
