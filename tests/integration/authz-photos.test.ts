// Every photo route, called as each kind of actor, with the exact answer each gets.
// Homeowners hold no photo permission yet (403); when issued documents carry photos, the data
// layer already limits them to the ids in their snapshots (see photos.test.ts).
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

const ctx = seededDbForFile();
const dir = mkdtempSync(path.join(os.tmpdir(), "warmstead-authz-photos-"));
let jpeg: Uint8Array;
let photoId = "";

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
});
afterAll(() => {
  resetStorage();
  delete process.env.UPLOAD_TMP_DIR;
  rmSync(dir, { recursive: true, force: true });
});

const readers = { anonymous: 401, "homeowner of the job": 403, "homeowner of another job": 403, "installer assigned": 200, "installer not assigned": 404, auditor: 200, owner: 200, "user of another company": 404 } as const;

const matrix: { name: string; expect: Record<Actor, number>; run: (as: string | null) => Promise<number> }[] = [
  {
    name: "GET /api/jobs/[id]/photos",
    expect: readers,
    run: async (as) => (actAs(as), await call(listRoute.GET as never, { path: `/api/jobs/${ids.demoJob}/photos?tag=during`, params: { id: ids.demoJob } })).status,
  },
  {
    name: "POST /api/jobs/[id]/photos",
    expect: { ...readers, "installer assigned": 201, auditor: 201, owner: 201 },
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
    name: "DELETE /api/photos/[photoId] (the assigned installer's own upload)",
    expect: readers,
    run: async (as) => {
      const id = await newPhoto();
      actAs(as);
      return (await call(photoRoute.DELETE as never, { method: "DELETE", params: { photoId: id } })).status;
    },
  },
  {
    name: "DELETE /api/photos/[photoId] (an auditor's upload)",
    expect: { ...readers, "installer assigned": 403 },
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
