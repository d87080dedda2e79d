import { z } from "zod";
import { unitSystems } from "@/db/schema";

/** A user's own display preferences (PUT /api/me/preferences). */
export const preferencesSchema = z.object({
  unitSystem: z.enum(unitSystems, { error: "Units must be “ip” (US units) or “si” (metric)." }),
});
export type PreferencesInput = z.infer<typeof preferencesSchema>;
