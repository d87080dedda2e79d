"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { authedAction } from "@/lib/authz/actions";
import { retryMailNow } from "@/lib/data/outbox";

const retrySchema = z.object({ id: z.string({ error: "Message is missing." }).trim().min(1, "Message is missing.") });

export const retryMailAction = authedAction("outbox:retry", retrySchema, async ({ id }, user) => {
  const row = await retryMailNow(user, id);
  revalidatePath("/outbox");
  return row.status === "sent" ? { ok: true, message: `Sent to ${row.to}.` } : { ok: false, message: `Still failing: ${row.lastError ?? "unknown error"}` };
});
