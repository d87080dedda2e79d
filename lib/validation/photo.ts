import { z } from "zod";
import type { PhotoTag } from "@/db/schema";
import { MAX_CAPTION_LENGTH } from "@/lib/photos/limits";
import { photoTagList, type PhotoTagName } from "@/lib/photos/tags";
import { choice, optionalText } from "./fields";

// The client-safe list must be the table's list.
const sameTags: [PhotoTag, PhotoTagName] extends [PhotoTagName, PhotoTag] ? true : never = true;
void sameTags;
const photoTags = photoTagList;

const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);
const optionalId = (label: string) => z.preprocess(blankToUndefined, z.string().trim().uuid(`${label} is not a valid id.`).optional());

/** The text fields that come with an uploaded photo (multipart form fields). */
export const photoUploadSchema = z.object({
  tag: choice("Tag", photoTags),
  caption: optionalText("Caption", MAX_CAPTION_LENGTH),
  surfaceId: optionalId("Surface"),
  crewLogEntryId: optionalId("Crew-log entry"),
  /** When the photo was taken (the file's last-modified time, from the browser), in ms since 1970. */
  takenAt: z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ error: "Taken at must be a time in milliseconds." })
      .int("Taken at must be a whole number of milliseconds.")
      .min(Date.UTC(1990, 0, 1), "Taken at is before 1990.")
      .refine((n) => n <= Date.now() + 24 * 3600_000, "Taken at is in the future.")
      .optional(),
  ),
});
export type PhotoUploadInput = z.infer<typeof photoUploadSchema>;

export const photoListQuerySchema = z.object({
  tag: z.preprocess(blankToUndefined, choice("Tag", photoTags).optional()),
  surfaceId: optionalId("Surface"),
});
export type PhotoListQuery = z.infer<typeof photoListQuerySchema>;
