// The savings report and proposal end to end: the auditor picks two photos and issues them and
// sends the link; the homeowner opens it from the captured e-mail, sets a password, reads the
// report with its photos, downloads the PDF with the button (and, without script, the plain link)
// and accepts the proposal; the office then sees the job Approved.
import bcrypt from "bcryptjs";
import { eq, inArray } from "drizzle-orm";
import type { Browser, Page } from "playwright-core";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { createDb } from "@/db";
import { photos, users } from "@/db/schema";
import { seedId } from "@/db/seed-scenario";
import { baseURL, DEMO_PASSWORD, launch, newPage, signInAs, snap } from "./support/browser";
import { linkFromMail, mailFiles } from "./support/mail";

const HOMEOWNER = "homeowner@kestrelbay.example";
let browser: Browser;
const uploaded: string[] = [];
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
  const db = createDb(inject("databaseUrl"));
  await db.update(users).set({ passwordHash: await bcrypt.hash(DEMO_PASSWORD, 10) }).where(eq(users.email, HOMEOWNER));
  // Other flows start from a job without photos; the rows go (the app itself refuses to delete an issued photo).
  if (uploaded.length) await db.delete(photos).where(inArray(photos.id, uploaded));
  db.$client.close();
});

async function uploadPhoto(page: Page, tag: string, caption: string, background: string) {
  const buffer = await sharp({ create: { width: 1200, height: 900, channels: 3, background, noise: { type: "gaussian", mean: 120, sigma: 20 } } }).jpeg({ quality: 80 }).toBuffer();
  const res = await page.request.post(`/api/jobs/${seedId("job:1006")}/photos`, {
    headers: { origin: baseURL() },
    multipart: { tag, caption, file: { name: "wall.jpg", mimeType: "image/jpeg", buffer } },
  });
  expect(res.status()).toBe(201);
  uploaded.push(((await res.json()) as { photo: { id: string } }).photo.id);
}

describe("savings report and proposal", () => {
  it("issued by the auditor, read, downloaded and accepted by the homeowner, seen Approved by the office", async () => {
    const staff = await newPage(browser);
    await signInAs(staff.page, "auditor@kestrelbay.example");
    await staff.page.waitForURL(/\/jobs$/);
    await uploadPhoto(staff.page, "before", "Stair wall before, flaking plaster", "#7a6a58");
    await uploadPhoto(staff.page, "after", "Stair wall after, holes plugged and painted", "#8c7b66");
    await staff.page.goto(`/jobs/${seedId("job:1006")}/documents`);
    const picker = staff.page.getByTestId("photo-picker");
    await picker.getByRole("checkbox", { name: /Stair wall before/ }).check();
    await picker.getByRole("checkbox", { name: /Stair wall after/ }).check();
    await picker.getByTestId("photo-choice-count").getByText(/^2 of \d+ chosen/).waitFor();
    await staff.page.getByRole("button", { name: "Issue savings report" }).click();
    await staff.page.getByTestId("documents-message").getByText(/Issued savings report version \d+ with 2 photos/).waitFor();
    await staff.page.getByRole("button", { name: "Issue proposal" }).click();
    await staff.page.getByTestId("documents-message").getByText(/Issued proposal version \d+/).waitFor();
    const before = mailFiles();
    await staff.page.getByRole("button", { name: "Send to homeowner" }).click();
    await staff.page.getByTestId("documents-message").getByText(/Link sent to homeowner@kestrelbay.example/).waitFor();
    await snap(staff.page, "documents-staff-desktop");

    const link = await linkFromMail(HOMEOWNER, /http:\/\/127\.0\.0\.1:\d+\/welcome\/[A-Za-z0-9_-]{43}/, before);
    const { page, context } = await newPage(browser, "phone");
    await page.goto(link);
    await page.getByLabel("New password").fill("report-reader-2026");
    await page.getByLabel("Confirm password").fill("report-reader-2026");
    await page.getByRole("button", { name: "Set password and continue" }).click();
    await page.waitForURL(/\/portal$/);
    await page.getByTestId("portal-documents").first().waitFor();
    await snap(page, "portal-documents-phone");

    await page.getByRole("link", { name: /^Savings report, version/ }).first().click();
    await page.getByTestId("results-yearly-saving").waitFor();
    // the two chosen photos, side by side, their thumbnails served to the homeowner
    const shown = page.getByTestId("report-photos").locator("img");
    await expect(shown.count()).resolves.toBe(2);
    for (const img of await shown.all()) {
      await img.scrollIntoViewIfNeeded();
      await expect.poll(() => img.evaluate((el: HTMLImageElement) => el.complete && el.naturalWidth)).toBeGreaterThan(0);
    }
    await page.getByTestId("report-photos").getByText("Stair wall after, holes plugged and painted").waitFor();
    await snap(page, "portal-report-phone");

    await page.goto("/portal");
    await page.getByRole("link", { name: /^Proposal, version/ }).first().click();
    const total = await page.getByTestId("proposal-total").textContent();
    expect(total).toMatch(/^\$[\d,]+\.\d\d$/);
    // Failures are said in words and leave the button usable: the server's reason, or a dropped line.
    const box = page.getByTestId("pdf-download");
    await page.route("**/api/documents/*/pdf", (r) => r.fulfill({ status: 500, contentType: "application/json", body: JSON.stringify({ error: "Something went wrong on our side." }) }));
    await box.getByRole("button", { name: "Download PDF" }).click();
    await box.getByRole("status").getByText("Something went wrong on our side.").waitFor();
    await page.unroute("**/api/documents/*/pdf");
    await page.route("**/api/documents/*/pdf", (r) => r.abort("internetdisconnected"));
    await box.getByRole("button", { name: "Download PDF" }).click();
    await box.getByRole("status").getByText(/The download was interrupted: check your connection/).waitFor();
    await page.unroute("**/api/documents/*/pdf");
    expect(await box.getByRole("button", { name: "Download PDF" }).isEnabled()).toBe(true);

    // The button: "Preparing the PDF…" while the server renders (button disabled), then the file is saved.
    await box.evaluate((el) => {
      const seen: string[] = [];
      (window as unknown as { pdfStates: string[] }).pdfStates = seen;
      const note = () => seen.push(`${el.querySelector("button")?.disabled ? "disabled" : "enabled"}|${el.querySelector("[role=status]")?.textContent ?? ""}`);
      new MutationObserver(note).observe(el, { subtree: true, childList: true, characterData: true, attributes: true });
    });
    // a slow line (about 40 kB/s) so the bytes arrive in many pieces and the percentage shows
    const cdp = await context.newCDPSession(page);
    await cdp.send("Network.enable");
    await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 20, downloadThroughput: 40_000, uploadThroughput: 40_000 });
    const [download] = await Promise.all([page.waitForEvent("download"), box.getByRole("button", { name: "Download PDF" }).click()]);
    await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
    expect(download.suggestedFilename()).toMatch(/^warmstead-proposal-job-1006-v\d+\.pdf$/);
    const saved = await download.path();
    const { readFileSync } = await import("node:fs");
    expect(readFileSync(saved).subarray(0, 5).toString()).toBe("%PDF-");
    await box.getByText(`Saved ${download.suggestedFilename()}.`).waitFor();
    const states = await page.evaluate(() => (window as unknown as { pdfStates: string[] }).pdfStates);
    expect(states).toContain("disabled|Preparing the PDF…");
    const percents = states.map((x) => /^disabled\|Downloading… (\d+) %$/.exec(x)?.[1]).filter(Boolean).map(Number);
    expect(percents.some((p) => p > 0 && p < 100)).toBe(true);
    expect(percents).toEqual([...percents].sort((a, b) => a - b));
    expect(states.at(-1)).toBe(`enabled|Saved ${download.suggestedFilename()}.`);
    // what the percentage is worked out from: the length the browser's own fetch sees, equal to the bytes it reads
    const href = await page.evaluate(() => location.pathname.replace("/portal/documents/", "/api/documents/") + "/pdf");
    const seenByFetch = await page.evaluate(async (u) => {
      const r = await fetch(u);
      return { length: r.headers.get("content-length") ?? r.headers.get("x-content-length"), bytes: (await r.arrayBuffer()).byteLength };
    }, href);
    expect(Number(seenByFetch.length)).toBe(seenByFetch.bytes);
    await snap(page, "portal-pdf-saved-phone");

    // Without script the same place is a plain link that downloads the file.
    const noScript = await browser.newContext({ baseURL: baseURL(), javaScriptEnabled: false, storageState: await context.storageState() });
    const plain = await noScript.newPage();
    await plain.goto(page.url());
    const pdfHref = await plain.getByRole("link", { name: "Download PDF" }).getAttribute("href");
    const pdf = await plain.request.get(pdfHref!);
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()["content-type"]).toBe("application/pdf");
    expect(Number(pdf.headers()["x-content-length"])).toBe((await pdf.body()).length);
    expect((await pdf.body()).subarray(0, 5).toString()).toBe("%PDF-");
    await noScript.close();

    await page.getByRole("button", { name: "Accept proposal" }).click();
    await page.getByText("Type your full name.").waitFor();
    await page.getByLabel("Your full name").fill("Eleanor Pashley-Wren");
    await page.getByLabel("I accept this proposal and its terms.").check();
    await page.getByRole("button", { name: "Accept proposal" }).click();
    await page.getByTestId("accepted").getByText(/Accepted by Eleanor Pashley-Wren/).waitFor();
    await snap(page, "portal-accepted-phone");
    await context.close();

    const owner = await newPage(browser);
    await signInAs(owner.page, "owner@kestrelbay.example");
    await owner.page.waitForURL(/\/jobs$/);
    await owner.page.goto(`/jobs/${seedId("job:1006")}`);
    await owner.page.getByTestId("stage-history").getByText(/Approved .*Eleanor Pashley-Wren/).first().waitFor();
    await owner.context.close();
    await staff.context.close();
  }, 150_000); // three PDF renders, one of them over a slowed line
});
