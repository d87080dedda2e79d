// The savings report and proposal end to end: the auditor issues them and sends the link; the
// homeowner opens it from the captured e-mail, sets a password, reads the report, downloads the
// PDF and accepts the proposal; the office then sees the job Approved.
import bcrypt from "bcryptjs";
import { eq } from "drizzle-orm";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { createDb } from "@/db";
import { users } from "@/db/schema";
import { seedId } from "@/db/seed-scenario";
import { DEMO_PASSWORD, launch, newPage, signInAs, snap } from "./support/browser";
import { linkFromMail, mailFiles } from "./support/mail";

const HOMEOWNER = "homeowner@kestrelbay.example";
let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
  const db = createDb(inject("databaseUrl"));
  await db.update(users).set({ passwordHash: await bcrypt.hash(DEMO_PASSWORD, 10) }).where(eq(users.email, HOMEOWNER));
  db.$client.close();
});

describe("savings report and proposal", () => {
  it("issued by the auditor, read, downloaded and accepted by the homeowner, seen Approved by the office", async () => {
    const staff = await newPage(browser);
    await signInAs(staff.page, "auditor@kestrelbay.example");
    await staff.page.waitForURL(/\/jobs$/);
    await staff.page.goto(`/jobs/${seedId("job:1006")}/documents`);
    await staff.page.getByRole("button", { name: "Issue savings report" }).click();
    await staff.page.getByTestId("documents-message").getByText(/Issued savings report version \d+/).waitFor();
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
    await snap(page, "portal-report-phone");

    await page.goto("/portal");
    await page.getByRole("link", { name: /^Proposal, version/ }).first().click();
    const total = await page.getByTestId("proposal-total").textContent();
    expect(total).toMatch(/^\$[\d,]+\.\d\d$/);
    const pdfHref = await page.getByRole("link", { name: "Download PDF" }).getAttribute("href");
    const pdf = await page.request.get(pdfHref!);
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()["content-type"]).toBe("application/pdf");
    expect((await pdf.body()).subarray(0, 5).toString()).toBe("%PDF-");

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
  });
});
