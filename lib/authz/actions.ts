import "server-only";
import { z } from "zod";
import { ApiError, fieldErrorsFrom, type FieldErrors } from "@/lib/api/errors";
import type { Permission } from "./permissions";
import { requireUser, type AuthUser } from "./guard";

/** What a form's server action hands back to `useActionState`: a message, field reasons, and what was typed. */
export type ActionState<V = Record<string, string>> = {
  ok?: boolean;
  message?: string;
  fields?: FieldErrors;
  values?: V;
};

export function formValues(formData: FormData): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [k, v] of formData.entries()) if (typeof v === "string" && !k.startsWith("$ACTION")) values[k] = v;
  return values;
}

/**
 * The server-action twin of `withAuth`: checks the session and permission, validates the form with
 * zod, and returns field errors with the typed values kept. `fn` may throw ApiError for 404/409 cases.
 */
export function authedAction<S extends z.ZodType, R extends ActionState | void>(
  permission: Permission,
  schema: S,
  fn: (input: z.infer<S>, user: AuthUser, formData: FormData) => Promise<R>,
) {
  return async (_prev: ActionState, formData: FormData): Promise<ActionState> => {
    const values = formValues(formData);
    let user: AuthUser;
    try {
      user = await requireUser(permission);
    } catch (err) {
      return { ok: false, message: err instanceof ApiError ? err.message : "Please sign in.", values };
    }
    const parsed = schema.safeParse(values);
    if (!parsed.success) return { ok: false, message: "Some fields need attention.", fields: fieldErrorsFrom(parsed.error), values };
    try {
      const result = await fn(parsed.data, user, formData);
      return result ?? { ok: true };
    } catch (err) {
      if (err instanceof ApiError) return { ok: false, message: err.message, fields: err.fields, values };
      throw err;
    }
  };
}
