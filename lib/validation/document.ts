import { z } from "zod";

export const issueDocumentSchema = z.strictObject({
  kind: z.enum(["savings-report", "proposal"], { error: "Kind must be savings-report or proposal." }),
  photoIds: z.array(z.string().min(1).max(100)).max(40, "At most 40 photos in one document.").default([]),
});

export const acceptProposalSchema = z.strictObject({
  name: z.string({ error: "Type your full name." }).trim().min(2, "Type your full name.").max(120, "Name must be at most 120 characters."),
  consent: z.literal(true, { error: "Tick the box to confirm you accept the proposal and its terms." }),
});
