"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import { authedAction } from "@/lib/authz/actions";
import { createJob } from "@/lib/data/jobs";
import { unflatten } from "@/lib/validation/fields";
import { newJobSchema } from "@/lib/validation/job";

const newJobForm = z.preprocess((v) => unflatten(v as Record<string, string>), newJobSchema);

export const createJobAction = authedAction("jobs:create", newJobForm, async (input, user) => {
  const job = await createJob(user, input);
  redirect(`/jobs/${job.id}?created=1`);
});
