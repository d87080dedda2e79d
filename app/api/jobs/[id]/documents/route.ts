import { parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { issueDocument, listDocuments } from "@/lib/data/documents";
import { issueDocumentSchema } from "@/lib/validation/document";

type Params = { id: string };

export const GET = withAuth<Params>(async (_req, { user, params }) => json({ documents: await listDocuments(user, params.id) }), { permission: "documents:read" });

export const POST = withAuth<Params>(
  async (req, { user, params }) => {
    const input = parseWith(issueDocumentSchema, await readJson(req));
    return json({ document: await issueDocument(user, params.id, input.kind, input.photoIds) }, 201);
  },
  { permission: "documents:issue" },
);
