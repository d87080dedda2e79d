// Photo tags, safe for client components (db/schema stays on the server).
export const photoTagList = ["before", "during", "after", "thermal"] as const;
export type PhotoTagName = (typeof photoTagList)[number];
export const photoTagLabels: Record<PhotoTagName, string> = { before: "Before", during: "During", after: "After", thermal: "Thermal" };
