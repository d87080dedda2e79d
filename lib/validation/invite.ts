import { z } from "zod";
import { optionalEmail } from "./fields";

/** Inviting a job's homeowner. The e-mail is needed only when the client record has none yet. */
export const inviteBodySchema = z.object({ email: optionalEmail("Homeowner e-mail") });
export const inviteFormSchema = inviteBodySchema.extend({ jobId: z.string({ error: "Job is missing." }).trim().min(1, "Job is missing.") });

const token = z.string({ error: "The link is incomplete." }).min(1, "The link is incomplete.");

// bcrypt reads only the first 72 bytes of a password, so longer ones are refused rather than cut.
export const newPasswordSchema = z
  .object({
    token,
    password: z
      .string({ error: "Enter a password." })
      .min(1, "Enter a password.")
      .min(10, "Password must be at least 10 characters.")
      .refine((p) => Buffer.byteLength(p, "utf8") <= 72, "Password must be at most 72 bytes (about 72 letters)."),
    confirm: z.string({ error: "Type the password again." }).min(1, "Type the password again to confirm it."),
  })
  .refine((v) => v.confirm === v.password, { path: ["confirm"], message: "Confirm password does not match the password." });

export const linkSignInSchema = z.object({ token });

export const signInLinkRequestSchema = z.object({
  email: z.string({ error: "Enter your e-mail address." }).trim().toLowerCase().min(1, "Enter your e-mail address.").email("E-mail does not look like an e-mail address."),
});

export const SIGN_IN_LINK_SENT = "If that address has an account, a link is on its way. It works once, within 15 minutes.";
export const LINK_GONE = "This link can no longer be used: it has expired or was already used.";
