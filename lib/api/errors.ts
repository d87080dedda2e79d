import { z } from "zod";

export type FieldErrors = Record<string, string[]>;

/** A failure the API answers on purpose: status, a plain message, and optional per-field reasons. */
export class ApiError extends Error {
  constructor(
    public readonly status: 400 | 401 | 403 | 404 | 409 | 413 | 415 | 422 | 429,
    message: string,
    public readonly fields?: FieldErrors,
    public readonly extra?: Record<string, unknown>,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export const unauthorized = () => new ApiError(401, "Please sign in.");
export const forbidden = () => new ApiError(403, "Your role does not allow this.");
export const notFound = (what = "Record") => new ApiError(404, `${what} not found.`);

/** zod issues → { "house.yearBuilt": ["Year built must be ..."] }, keyed by the dotted field path. */
export function fieldErrorsFrom(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_form";
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

export function validationError(error: z.ZodError) {
  return new ApiError(422, "Some fields need attention.", fieldErrorsFrom(error));
}

export function parseWith<T extends z.ZodType>(schema: T, input: unknown): z.infer<T> {
  const result = schema.safeParse(input);
  if (!result.success) throw validationError(result.error);
  return result.data;
}
