import { jobStageLabels, stageBadge, type JobStage } from "@/lib/stages";

export function StageBadge({ stage }: { stage: JobStage }) {
  return <span className={`inline-block rounded-full px-2.5 py-0.5 text-sm font-semibold ${stageBadge[stage]}`}>{jobStageLabels[stage]}</span>;
}
