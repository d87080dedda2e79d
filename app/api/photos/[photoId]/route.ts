import { notFound } from "@/lib/api/errors";
import { json } from "@/lib/api/respond";
import { withAuth } from "@/lib/authz/guard";
import { deletePhoto, findReadablePhoto } from "@/lib/data/photos";
import { photoTypeExtension, type PhotoContentType } from "@/lib/photos/limits";
import { removeQuietly } from "@/lib/photos/pipeline";
import { imageResponse } from "@/lib/photos/respond";
import { getStorage } from "@/lib/storage";

type Params = { photoId: string };

/** The stored original (location and other metadata already stripped). */
export const GET = withAuth<Params>(
  async (req, { user, params }) => {
    const photo = await findReadablePhoto(user, params.photoId);
    if (!photo) throw notFound("Photo");
    const object = await getStorage().get(photo.storageKey);
    if (!object) throw notFound("Photo file");
    const ext = photoTypeExtension[photo.contentType as PhotoContentType] ?? "img";
    return imageResponse(req, object, { contentType: photo.contentType, etag: photo.id, filename: `photo-${photo.id}.${ext}` });
  },
  { permission: "photos:read" },
);

export const DELETE = withAuth<Params>(
  async (_req, { user, params }) => {
    const photo = await deletePhoto(user, params.photoId);
    await removeQuietly(getStorage(), [photo.storageKey, photo.thumbnailKey]);
    return json({ deleted: photo.id });
  },
  { permission: "photos:delete" },
);
