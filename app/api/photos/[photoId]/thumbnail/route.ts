import { notFound } from "@/lib/api/errors";
import { withAuth } from "@/lib/authz/guard";
import { findReadablePhoto } from "@/lib/data/photos";
import { imageResponse } from "@/lib/photos/respond";
import { getStorage } from "@/lib/storage";

type Params = { photoId: string };

/** The WebP thumbnail (at most 480 px on its longer side). */
export const GET = withAuth<Params>(
  async (req, { user, params }) => {
    const photo = await findReadablePhoto(user, params.photoId);
    if (!photo?.thumbnailKey) throw notFound("Photo");
    const object = await getStorage().get(photo.thumbnailKey);
    if (!object) throw notFound("Photo file");
    return imageResponse(req, object, { contentType: "image/webp", etag: `${photo.id}-thumb`, filename: `photo-${photo.id}-thumb.webp` });
  },
  { permission: "photos:read" },
);
