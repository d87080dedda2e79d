import { json } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { getDocument } from "@/lib/data/documents";

export const GET = withAuth<{ docId: string }>(async (_req, { user, params }) => json({ document: await getDocument(user, params.docId) }), { permission: "documents:read" });
