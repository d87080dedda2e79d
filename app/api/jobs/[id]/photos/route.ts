import { ApiError, notFound, parseWith } from "@/lib/api/errors";
import { json } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { assertPhotoLinks, createPhoto, findJobForPhotos, listPhotos } from "@/lib/data/photos";
import { photoTypeExtension } from "@/lib/photos/limits";
import { receivePhotoUpload } from "@/lib/photos/multipart";
import { processAndStore, removeQuietly } from "@/lib/photos/pipeline";
import { getStorage, newPhotoKeys } from "@/lib/storage";
import { photoListQuerySchema, photoUploadSchema } from "@/lib/validation/photo";

type Params = { id: string };

export const GET = withAuth<Params>(
  async (req, { user, params }) => {
    const query = parseWith(photoListQuerySchema, Object.fromEntries(req.nextUrl.searchParams));
    const photos = await listPhotos(user, params.id, query);
    if (!photos) throw notFound("Job");
    return json({ photos });
  },
  { permission: "photos:read" },
);

/** multipart/form-data: file (JPEG, PNG or WebP, ≤ 20 MB), tag, caption?, surfaceId?, crewLogEntryId?, takenAt? */
export const POST = withAuth<Params>(
  async (req, { user, params }) => {
    const job = await findJobForPhotos(user, params.id);
    if (!job) throw notFound("Job");
    const upload = await receivePhotoUpload(req);
    try {
      const input = parseWith(photoUploadSchema, upload.fields);
      if (!upload.file) throw new ApiError(422, "Choose a photo to upload.", { file: ["Choose a photo to upload."] });
      await assertPhotoLinks(job.id, input);
      const storage = getStorage();
      const keys = newPhotoKeys(job.companyId, job.id, photoTypeExtension[upload.file.sniff.contentType]);
      const files = await processAndStore(upload.file, storage, keys);
      try {
        const photo = await createPhoto(user, job, input, files);
        return json({ photo }, 201);
      } catch (err) {
        await removeQuietly(storage, [files.storageKey, files.thumbnailKey]);
        throw err;
      }
    } finally {
      await upload.cleanup();
    }
  },
  { permission: "photos:upload" },
);
