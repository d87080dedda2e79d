// The actors of every authorisation matrix, and how a server action's answer maps to a status.
// Each feature keeps its own matrix file (tests/integration/authz-*.test.ts) built on these.
import { ids } from "./setup";

export const actors = {
  anonymous: null,
  "homeowner of the job": ids.homeowner,
  "homeowner of another job": ids.homeowner2,
  "installer assigned": ids.installer,
  "installer not assigned": ids.installer2,
  auditor: ids.auditor,
  owner: ids.owner,
  "user of another company": ids.otherOwner,
} as const;
export type Actor = keyof typeof actors;

/** Server actions answer with state, not status; map it to the status a route would give. */
export function actionStatus(state: { ok?: boolean; message?: string }) {
  if (state.ok) return 200;
  if (state.message === "Please sign in.") return 401;
  if (state.message === "Your role does not allow this.") return 403;
  if (state.message?.includes("not found")) return 404;
  return 422;
}
export async function runAction(action: (s: object, fd: FormData) => Promise<{ ok?: boolean; message?: string }>, fd: FormData) {
  try {
    return actionStatus(await action({}, fd));
  } catch (err) {
    if ((err as { digest?: string }).digest?.startsWith("NEXT_REDIRECT")) return 303;
    throw err;
  }
}

