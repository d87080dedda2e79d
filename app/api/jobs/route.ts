import { parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { createJob, listJobs } from "@/lib/data/jobs";
import { jobListQuerySchema, newJobSchema } from "@/lib/validation/job";

export const GET = withAuth(
  async (req, { user }) => {
    const query = parseWith(jobListQuerySchema, Object.fromEntries(req.nextUrl.searchParams));
    const { jobs, total } = await listJobs(user, query);
    return json({ jobs, total, page: query.page, pageSize: query.pageSize });
  },
  { permission: "jobs:list" },
);

export const POST = withAuth(
  async (req, { user }) => {
    const input = parseWith(newJobSchema, await readJson(req));
    const job = await createJob(user, input);
    return json({ job }, 201);
  },
  { permission: "jobs:create" },
);
