// Every photo route, called as each kind of actor, with the exact answer each gets.
// Homeowners hold photos:read, and the data layer limits it to the photos named by their own
// house's issued documents: an included photo answers 200, any other photo 404, as for a stranger.
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { LocalStorage, resetStorage } from "@/lib/storage";
import { actAs } from "../support/auth-mock";
import { call } from "../support/route";
import { actors, type Actor } from "./matrix-support";
import { getImage, makeImage, postPhoto } from "./photos-support";
import { ids, seededDbForFile } from "./setup";

vi.mock("@/lib/auth", () => import("../support/auth-mock"));

const listRoute = await import("@/app/api/jobs/[id]/photos/route");
const photoRoute = await import("@/app/api/photos/[photoId]/route");
const thumbRoute = await import("@/app/api/photos/[photoId]/thumbnail/route");
const docsRoute = await import("@/app/api/jobs/[id]/documents/route");

const ctx = seededDbForFile();
const dir = mkdtempSync(path.join(os.tmpdir(), "warmstead-authz-photos-"));
let jpeg: Uint8Array;
let photoId = ""; // included in an issued savings report
let hiddenId = ""; // a photo of the same job that no issued document includes

/** A photo on the demo job, uploaded by the assigned installer. */
async function newPhoto() {
  actAs(ids.installer);
  const res = await postPhoto(listRoute.POST as never, ids.demoJob, { tag: "during" }, { bytes: jpeg, name: "wall.jpg" });
  if (res.status !== 201) throw new Error(`setup upload failed: ${res.status} ${res.json.error}`);
  return res.json.photo!.id as string;
}

beforeAll(async () => {
  process.env.UPLOAD_TMP_DIR = path.join(dir, "incoming");
  resetStorage(new LocalStorage(path.join(dir, "store")));
  jpeg = await makeImage("jpeg");
  photoId = await newPhoto();
  hiddenId = await newPhoto();
  actAs(ids.auditor);
  const issued = await call(docsRoute.POST as never, { method: "POST", params: { id: ids.demoJob }, body: { kind: "savings-report", photoIds: [photoId] } });
  if (issued.status !== 201) throw new Error(`setup issue failed: ${issued.status}`);
});
afterAll(() => {
  resetStorage();
  delete process.env.UPLOAD_TMP_DIR;
  rmSync(dir, { recursive: true, force: true });
});

const staffReaders = { anonymous: 401, "installer assigned": 200, "installer not assigned": 404, auditor: 200, owner: 200, "user of another company": 404 } as const;
/** A photo included in the house's issued document. */
const readers = { ...staffReaders, "homeowner of the job": 200, "homeowner of another job": 404 } as const;
/** A photo of the same job that no issued document includes. */
const hiddenReaders = { ...staffReaders, "homeowner of the job": 404, "homeowner of another job": 404 } as const;
/** Uploading and deleting: homeowners hold neither permission. */
const writers = { ...staffReaders, "homeowner of the job": 403, "homeowner of another job": 403 } as const;

const matrix: { name: string; expect: Record<Actor, number>; run: (as: string | null) => Promise<number> }[] = [
  {
    name: "GET /api/jobs/[id]/photos (a homeowner's list holds only the included photo)",
    expect: readers,
    run: async (as) => (actAs(as), await call(listRoute.GET as never, { path: `/api/jobs/${ids.demoJob}/photos?tag=during`, params: { id: ids.demoJob } })).status,
  },
  {
    name: "POST /api/jobs/[id]/photos",
    expect: { ...writers, "installer assigned": 201, auditor: 201, owner: 201 },
    run: async (as) => (actAs(as), await postPhoto(listRoute.POST as never, ids.demoJob, { tag: "before", caption: "matrix" }, { bytes: jpeg, name: "m.jpg" })).status,
  },
  {
    name: "GET /api/photos/[photoId]",
    expect: readers,
    run: async (as) => (actAs(as), await getImage(photoRoute.GET as never, photoId, `/api/photos/${photoId}`)).status,
  },
  {
    name: "GET /api/photos/[photoId]/thumbnail",
    expect: readers,
    run: async (as) => (actAs(as), await getImage(thumbRoute.GET as never, photoId, `/api/photos/${photoId}/thumbnail`)).status,
  },
  {
    name: "GET /api/photos/[photoId] (a photo of the job not in any issued document)",
    expect: hiddenReaders,
    run: async (as) => (actAs(as), await getImage(photoRoute.GET as never, hiddenId, `/api/photos/${hiddenId}`)).status,
  },
  {
    name: "GET /api/photos/[photoId]/thumbnail (a photo of the job not in any issued document)",
    expect: hiddenReaders,
    run: async (as) => (actAs(as), await getImage(thumbRoute.GET as never, hiddenId, `/api/photos/${hiddenId}/thumbnail`)).status,
  },
  {
    name: "DELETE /api/photos/[photoId] (the assigned installer's own upload)",
    expect: writers,
    run: async (as) => {
      const id = await newPhoto();
      actAs(as);
      return (await call(photoRoute.DELETE as never, { method: "DELETE", params: { photoId: id } })).status;
    },
  },
  {
    name: "DELETE /api/photos/[photoId] (an auditor's upload)",
    expect: { ...writers, "installer assigned": 403 },
    run: async (as) => {
      actAs(ids.auditor);
      const id = (await postPhoto(listRoute.POST as never, ids.demoJob, { tag: "after" }, { bytes: jpeg, name: "a.jpg" })).json.photo!.id as string;
      actAs(as);
      return (await call(photoRoute.DELETE as never, { method: "DELETE", params: { photoId: id } })).status;
    },
  },
];

describe.each(matrix)("$name", ({ expect: expected, run }) => {
  it.each(Object.keys(actors) as Actor[])("as %s", async (actor) => {
    void ctx;
    expect(await run(actors[actor])).toBe(expected[actor]);
  });
});

describe("a homeowner's photo list", () => {
  it("holds exactly the photos their house's issued documents include", async () => {
    actAs(ids.homeowner);
    const mine = await call<{ photos: { id: string }[] }>(listRoute.GET as never, { path: `/api/jobs/${ids.demoJob}/photos`, params: { id: ids.demoJob } });
    expect(mine.json.photos.map((p) => p.id)).toEqual([photoId]);
    actAs(ids.auditor);
    const all = await call<{ photos: { id: string }[] }>(listRoute.GET as never, { path: `/api/jobs/${ids.demoJob}/photos`, params: { id: ids.demoJob } });
    expect(all.json.photos.map((p) => p.id)).toEqual(expect.arrayContaining([photoId, hiddenId]));
  });
});
