import { z } from "zod";
import { num, optionalNum, optionalText } from "./fields";

// Bounds for one crew-log entry. A wall of an old house takes tens of bags; one entry over
// 200 bags or 2,000 holes is a typing slip, not a day's work.
export const CREW_LIMITS = { bags: 200, holes: 2000, bays: 1000, note: 1000 } as const;

const DAY_MS = 24 * 3600_000;
const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

const requestId = (label: string) =>
  z.string({ error: `${label} is required (a UUID made on the device).` }).trim().uuid(`${label} must be a UUID made on the device.`);

/** When the entry was made on the phone (it may have waited offline): ms since 1970, not in the future. */
const loggedAt = z.preprocess(
  blankToUndefined,
  z.coerce
    .number({ error: "Logged at must be a time in milliseconds." })
    .int("Logged at must be a whole number of milliseconds.")
    .refine((n) => n >= Date.now() - 30 * DAY_MS, "Logged at is more than 30 days ago.")
    .refine((n) => n <= Date.now() + 10 * 60_000, "Logged at is in the future.")
    .optional(),
);

const flag = (label: string) =>
  z.preprocess((v) => (v === "true" || v === "on" ? true : v === "false" || v === undefined || v === "" ? false : v), z.boolean({ error: `${label} must be true or false.` }));

export const crewLogEntrySchema = z.object({
  clientRequestId: requestId("Client request id"),
  surfaceId: z.string({ error: "Choose the wall (surfaceId)." }).trim().min(1, "Choose the wall (surfaceId).").max(100, "Wall (surfaceId) is not a valid id."),
  holesDrilled: num("Holes drilled", 0, CREW_LIMITS.holes, { int: true }).default(0),
  bagsBlown: num("Bags blown", 0, CREW_LIMITS.bags, { unit: "bags" })
    .refine((n) => Math.abs(n * 100 - Math.round(n * 100)) < 1e-6, "Bags blown can have at most two decimals.")
    .default(0),
  blockedBays: num("Blocked bays", 0, CREW_LIMITS.bays, { int: true }).default(0),
  prefilledBays: num("Pre-filled bays", 0, CREW_LIMITS.bays, { int: true }).default(0),
  note: optionalText("Note", CREW_LIMITS.note),
  resolution: optionalText("Resolution", CREW_LIMITS.note),
  finished: flag("Finished"),
  loggedAt,
});
export type CrewLogEntryInput = z.infer<typeof crewLogEntrySchema>;

export const safetyAckSchema = z.object({
  cautionKeys: z.array(z.string({ error: "Caution keys must be text." }).trim().min(1).max(100), { error: "Caution keys must be a list." }).max(50, "Caution keys: at most 50."),
});
export type SafetyAckInput = z.infer<typeof safetyAckSchema>;

export const testOutSchema = z.object({
  /** Made on the device; it becomes the reading's id, so a retried submit records it once. */
  clientRequestId: requestId("Client request id"),
  cfm50: num("CFM50", 1, 100_000, { unit: "CFM" }),
  outdoorTempF: optionalNum("Outdoor temperature", -60, 130, { unit: "°F" }),
  windMph: optionalNum("Wind", 0, 60, { unit: "mph" }),
  notes: optionalText("Notes", CREW_LIMITS.note),
  testedAt: z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ error: "Tested at must be a time in milliseconds." })
      .int("Tested at must be a whole number of milliseconds.")
      .refine((n) => n >= Date.now() - 30 * DAY_MS, "Tested at is more than 30 days ago.")
      .refine((n) => n <= Date.now() + 10 * 60_000, "Tested at is in the future.")
      .optional(),
  ),
});
export type TestOutInput = z.infer<typeof testOutSchema>;
