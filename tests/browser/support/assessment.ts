import type { Page } from "playwright-core";
import { expect } from "vitest";
import type { AssessmentDoc } from "@/lib/assessment/doc";

/** Creates a job through the API as the signed-in user and returns its id. */
export async function createJob(page: Page, label: string): Promise<string> {
  const res = await page.request.post("/api/jobs", {
    data: { client: { name: `Table Client ${label}` }, house: { street: `${label} Quarry Lane`, city: "Harrowmere", state: "NJ", postalCode: "07000", yearBuilt: 1928, stories: "2", conditionedAreaFt2: 1600, ceilingHeightFt: 8, bedrooms: 3, foundation: "basement", shielding: "normal" } },
    headers: { origin: new URL(page.url()).origin },
  });
  expect(res.status()).toBe(201);
  return ((await res.json()) as { job: { id: string } }).job.id;
}

export async function serverDoc(page: Page, jobId: string): Promise<{ version: number; doc: AssessmentDoc }> {
  const res = await page.request.get(`/api/jobs/${jobId}/assessment`);
  expect(res.status()).toBe(200);
  return (await res.json()) as { version: number; doc: AssessmentDoc };
}

/** Replaces the job's assessment through the API (the same PUT the workspace sends). */
export async function putDoc(page: Page, jobId: string, doc: AssessmentDoc) {
  const { version } = await serverDoc(page, jobId);
  const res = await page.request.put(`/api/jobs/${jobId}/assessment`, { data: { version, doc }, headers: { origin: new URL(page.url()).origin } });
  expect(res.status(), await res.text()).toBe(200);
}

export async function saved(page: Page) {
  await page.waitForFunction(() => document.querySelector("[data-testid=save-status]")?.getAttribute("data-status") === "saved", undefined, { timeout: 15_000 });
}
