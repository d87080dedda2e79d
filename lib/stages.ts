// Job stages (PRODUCT.md): Intake → Assessed → Proposed → Approved → Installing → Verified → Closed.
export const jobStages = ["intake", "assessed", "proposed", "approved", "installing", "verified", "closed"] as const;
export type JobStage = (typeof jobStages)[number];

export const jobStageLabels: Record<JobStage, string> = {
  intake: "Intake",
  assessed: "Assessed",
  proposed: "Proposed",
  approved: "Approved",
  installing: "Installing",
  verified: "Verified",
  closed: "Closed",
};

/** Badge classes per stage: text colours meet 4.5:1 on their tint. */
export const stageBadge: Record<JobStage, string> = {
  intake: "bg-paper-deep text-charcoal",
  assessed: "bg-spruce-50 text-spruce-800",
  proposed: "bg-ember-50 text-ember-700",
  approved: "bg-spruce-100 text-spruce-900",
  installing: "bg-ember-100 text-ember-700",
  verified: "bg-spruce-700 text-white",
  closed: "bg-charcoal text-white",
};
