import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInAs, snap } from "./support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe("each role signs in to its own world", () => {
  it("the owner sees every job, the team page and the activity log", async () => {
    const { page, context } = await newPage(browser);
    await signInAs(page, "owner@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    await expect(page.getByTestId("company-name").textContent()).resolves.toBe("Kestrel Bay Home Performance");
    await expect(page.getByTestId("signed-in-user").textContent()).resolves.toContain("Maren Holloway");
    await page.getByTestId("jobs-count").getByText(/^\d+ jobs$/).waitFor();
    // Eight seeded jobs, plus any another browser test created.
    expect(parseInt((await page.getByTestId("jobs-count").textContent())!, 10)).toBeGreaterThanOrEqual(8);
    await expect(page.getByRole("link", { name: "Team" }).count()).resolves.toBe(1);
    await snap(page, "jobs-owner-desktop");
    await page.getByRole("link", { name: "Team" }).click();
    await page.getByRole("heading", { name: "Team", exact: true }).waitFor();
    await snap(page, "team-owner-desktop");
    await page.getByRole("link", { name: "Activity" }).click();
    await page.getByRole("heading", { name: "Activity", exact: true }).waitFor();
    await expect(page.getByRole("cell", { name: "sign-in", exact: true }).count()).resolves.toBeGreaterThan(0);
    await context.close();
  });

  it("an auditor sees all jobs but no team page, and can open a job and change its stage", async () => {
    const { page, context } = await newPage(browser);
    await signInAs(page, "auditor@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    await expect(page.getByRole("link", { name: "Team" }).count()).resolves.toBe(0);
    // Job 1005 (Proposed in the seed) is left alone by the other browser flows.
    await page.getByLabel("Search").fill("Oriel");
    await page.getByTestId("jobs-count").getByText("1 job").waitFor();
    await page.getByRole("link", { name: "#1005" }).click();
    await page.getByRole("heading", { name: /Attic insulation and crawlspace/ }).waitFor();
    await page.getByLabel("Move to").selectOption("approved");
    await page.getByRole("button", { name: "Change stage" }).click();
    await page.getByTestId("stage-message").getByText("Moved to Approved.").waitFor();
    await page.getByTestId("stage-history").getByText(/Approved \(from Proposed\) — Tobias Lindqvist-Ayre/).waitFor();
    await snap(page, "job-auditor-desktop");
    const team = await page.goto("/team");
    expect(page.url()).toMatch(/\/jobs\?denied=1$/);
    expect(team?.status()).toBe(200);
    await context.close();
  });

  it("an installer on a phone sees only assigned jobs and no new-job button", async () => {
    const { page, context } = await newPage(browser, "phone");
    await signInAs(page, "installer2@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    await page.getByTestId("jobs-count").getByText("2 jobs").waitFor();
    await expect(page.getByRole("link", { name: "New job" }).count()).resolves.toBe(0);
    const rows = await page.getByTestId("jobs-rows").locator("tr").allTextContents();
    expect(rows.join(" ")).not.toContain("#1006");
    await snap(page, "jobs-installer-phone");
    const res = await page.request.get("/api/jobs?q=1006");
    expect((await res.json()).total).toBe(0);
    await context.close();
  });

  it("a homeowner lands in the portal with only their house and cannot reach the office", async () => {
    const { page, context } = await newPage(browser, "phone");
    await signInAs(page, "homeowner@kestrelbay.example");
    await page.waitForURL(/\/portal$/);
    const houses = await page.getByTestId("portal-houses").textContent();
    expect(houses).toContain("27 Tansyfield Road");
    expect(houses).not.toContain("Larkmoor");
    await snap(page, "portal-homeowner-phone");
    await page.goto("/jobs");
    expect(page.url()).toMatch(/\/portal$/);
    const api = await page.request.get("/api/jobs");
    expect(api.status()).toBe(403);
    await context.close();
  });

  it("a wrong password gets a clear message that does not say whether the e-mail exists", async () => {
    const { page, context } = await newPage(browser);
    await signInAs(page, "owner@kestrelbay.example", "not-the-password");
    const msg = page.getByTestId("form-message");
    await msg.waitFor();
    await expect(msg.textContent()).resolves.toBe("That e-mail and password do not match an active account. Check both and try again.");
    await expect(page.getByLabel("E-mail").inputValue()).resolves.toBe("owner@kestrelbay.example");
    await signInAs(page, "nobody@kestrelbay.example", "not-the-password");
    await expect(page.getByTestId("form-message").textContent()).resolves.toBe("That e-mail and password do not match an active account. Check both and try again.");
    await context.close();
  });

  it("signing out ends the session", async () => {
    const { page, context } = await newPage(browser);
    await signInAs(page, "auditor2@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL(/\/sign-in/);
    await page.goto("/jobs");
    expect(page.url()).toMatch(/\/sign-in/);
    await context.close();
  });
});
