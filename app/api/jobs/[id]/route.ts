import { forbidden, notFound, parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { can } from "@/lib/authz/permissions";
import { getJob, updateJob } from "@/lib/data/jobs";
import { jobPatchSchema } from "@/lib/validation/job";

type Params = { id: string };

export const GET = withAuth<Params>(
  async (_req, { user, params }) => {
    const job = await getJob(user, params.id);
    if (!job) throw notFound("Job");
    return json({ job });
  },
  { permission: "jobs:read" },
);

export const PATCH = withAuth<Params>(
  async (req, { user, params }) => {
    const patch = parseWith(jobPatchSchema, await readJson(req));
    if (patch.stage !== undefined && !can(user.role, "jobs:stage")) throw forbidden();
    const job = await updateJob(user, params.id, patch);
    return json({ job });
  },
  { permission: "jobs:update" },
);
