import { parseWith } from "@/lib/api/errors";
import { json, readJson } from "@/lib/api/respond";
import { assessmentDocSchema, type AssessmentDoc } from "@/lib/assessment/doc";
import { withAuth } from "@/lib/authz/guard";
import { can } from "@/lib/authz/permissions";
import { analyzeDoc, loadAssessment, saveAssessment } from "@/lib/data/assessment";
import { saveAssessmentSchema } from "@/lib/validation/assessment";

type Params = { id: string };

/** Installers read the assessment of their jobs without prices: fuel price, upgrade costs and per-job pricing are removed. */
function withoutPrices(doc: AssessmentDoc): AssessmentDoc {
  return { ...doc, heating: { ...doc.heating, pricePerUnitUSD: 0 }, upgrades: doc.upgrades.map((u) => ({ ...u, costUSD: 0, priceBookItemId: null, pricing: null })) };
}

export const GET = withAuth<Params>(
  async (_req, { user, params }) => {
    const loaded = await loadAssessment(user, params.id);
    const pricesVisible = can(user.role, "prices:read");
    const doc = pricesVisible ? loaded.doc : withoutPrices(loaded.doc);
    const { issues } = analyzeDoc(loaded.doc);
    return json({ ...loaded, doc, pricesVisible, canEdit: can(user.role, "assessment:write"), issues });
  },
  { permission: "assessment:read" },
);

export const PUT = withAuth<Params>(
  async (req, { user, params }) => {
    const body = parseWith(saveAssessmentSchema, await readJson(req));
    // Parsed on its own so field errors are keyed by the document's paths ("surfaces.1.grossAreaFt2").
    const doc = parseWith(assessmentDocSchema, body.doc) as AssessmentDoc;
    const saved = await saveAssessment(user, params.id, body.version, doc);
    const headline = saved.analysis
      ? { annualCostUSD: saved.analysis.baseline.energy.costUSD, designLoadBtuh: saved.analysis.baseline.designLoad.totalBtuh, packageSavingsUSD: saved.analysis.package.savings.usd }
      : null;
    return json({ version: saved.version, issues: saved.issues, headline });
  },
  { permission: "assessment:write" },
);
