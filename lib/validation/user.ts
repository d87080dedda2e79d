import { z } from "zod";
import { roleNames } from "@/lib/authz/permissions";
import { choice, text } from "./fields";

export const staffRoles = ["owner", "auditor", "installer"] as const;

export const newUserSchema = z.object({
  name: text("Name", 120),
  email: z.string().trim().toLowerCase().min(1, "Enter an e-mail address.").email("E-mail does not look like an e-mail address."),
  role: choice("Role", staffRoles),
  password: z.string().min(10, "Temporary password must be at least 10 characters.").max(200, "Temporary password must be at most 200 characters."),
});

export const setRoleSchema = z.object({ userId: z.string().min(1), role: choice("Role", roleNames) });
export const setDisabledSchema = z.object({ userId: z.string().min(1), disabled: z.enum(["true", "false"]).transform((v) => v === "true") });
