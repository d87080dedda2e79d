"use server";

import { revalidatePath } from "next/cache";
import { authedAction } from "@/lib/authz/actions";
import { addUser, setUserDisabled, setUserRole } from "@/lib/data/users";
import { newUserSchema, setDisabledSchema, setRoleSchema } from "@/lib/validation/user";

export const addUserAction = authedAction("users:manage", newUserSchema, async (input, user) => {
  await addUser(user, input);
  revalidatePath("/team");
  return { ok: true, message: `${input.name} can now sign in as ${input.role}.` };
});

export const setRoleAction = authedAction("users:manage", setRoleSchema, async (input, user) => {
  await setUserRole(user, input.userId, input.role);
  revalidatePath("/team");
  return { ok: true, message: "Role changed." };
});

export const setDisabledAction = authedAction("users:manage", setDisabledSchema, async (input, user) => {
  await setUserDisabled(user, input.userId, input.disabled);
  revalidatePath("/team");
  return { ok: true, message: input.disabled ? "Account disabled; it is signed out on its next request." : "Account enabled." };
});
