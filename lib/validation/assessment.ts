import { z } from "zod";

export const saveAssessmentSchema = z.object({
  version: z.number({ error: "Send the version of the job you edited." }).int().positive(),
  doc: z.record(z.string(), z.unknown(), { error: "Send the assessment as doc." }),
});
