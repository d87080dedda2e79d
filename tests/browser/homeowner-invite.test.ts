// The auditor invites the homeowner of job 1006; the homeowner opens the link from the captured
// e-mail, sets a password, lands in the portal, and signs in again with it. Then the e-mailed
// sign-in link, a used link, and the outbox as staff see it.
import bcrypt from "bcryptjs";
import { eq } from "drizzle-orm";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { createDb } from "@/db";
import { users } from "@/db/schema";
import { seedId } from "@/db/seed-scenario";
import { DEMO_PASSWORD, launch, newPage, signInAs, snap } from "./support/browser";
import { linkFromMail, mailFiles } from "./support/mail";

const HOMEOWNER = "homeowner@kestrelbay.example";
const NEW_PASSWORD = "tansyfield-cold-upstairs";
let browser: Browser;

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
  // Other browser files sign the homeowner in with the demo password: put it back.
  const db = createDb(inject("databaseUrl"));
  await db.update(users).set({ passwordHash: await bcrypt.hash(DEMO_PASSWORD, 10) }).where(eq(users.email, HOMEOWNER));
  db.$client.close();
});

async function signOut(page: Page) {
  await page.getByRole("button", { name: "Sign out" }).click();
  await page.waitForURL(/\/sign-in/);
}

describe("homeowner invitation", () => {
  it("auditor invites; homeowner sets a password from the e-mailed link, lands in the portal, signs in again", async () => {
    const staff = await newPage(browser);
    await signInAs(staff.page, "auditor@kestrelbay.example");
    await staff.page.waitForURL(/\/jobs$/);
    const before = mailFiles();
    const res = await staff.page.request.post(`/api/jobs/${seedId("job:1006")}/invite`);
    expect(res.status()).toBe(201);
    const { invite } = await res.json();
    expect(invite).toMatchObject({ to: HOMEOWNER, created: false, mail: { status: "sent" } });

    const link = await linkFromMail(HOMEOWNER, /http:\/\/127\.0\.0\.1:\d+\/welcome\/[A-Za-z0-9_-]{43}/, before);
    const home = await newPage(browser, "phone");
    const { page } = home;
    await page.goto(link);
    await page.getByRole("heading", { name: "Welcome, Eleanor" }).waitFor();
    await snap(page, "welcome-phone");

    // A short password and a mismatch are explained beside their fields.
    await page.getByLabel("New password").fill("short");
    await page.getByLabel("Confirm password").fill("short");
    await page.getByRole("button", { name: "Set password and continue" }).click();
    await page.getByTestId("error-password").getByText("Password must be at least 10 characters.").waitFor();
    await page.getByLabel("New password").fill(NEW_PASSWORD);
    await page.getByLabel("Confirm password").fill(`${NEW_PASSWORD}x`);
    await page.getByRole("button", { name: "Set password and continue" }).click();
    await page.getByTestId("error-confirm").getByText("Confirm password does not match the password.").waitFor();
    await snap(page, "welcome-errors-phone");

    await page.getByLabel("New password").fill(NEW_PASSWORD);
    await page.getByLabel("Confirm password").fill(NEW_PASSWORD);
    await page.getByRole("button", { name: "Set password and continue" }).click();
    await page.waitForURL(/\/portal$/);
    expect(await page.getByTestId("portal-houses").textContent()).toContain("27 Tansyfield Road");
    await snap(page, "portal-after-welcome-phone");

    await signOut(page);
    await signInAs(page, HOMEOWNER, NEW_PASSWORD);
    await page.waitForURL(/\/portal$/);
    await signOut(page);

    // The link worked once.
    await page.goto(link);
    await page.getByRole("heading", { name: "This invitation has already been used" }).waitFor();
    await snap(page, "welcome-used-phone");
    await home.context.close();

    // Staff see the message in the outbox, link blanked.
    await staff.page.goto("/outbox");
    await staff.page.getByRole("heading", { name: "Outbox", exact: true }).waitFor();
    const outbox = await staff.page.getByTestId("outbox").textContent();
    expect(outbox).toContain(`to ${HOMEOWNER}`);
    expect(outbox).toContain("Sent");
    await snap(staff.page, "outbox-auditor-desktop");
    await staff.context.close();
  });

  it("a homeowner asks for a sign-in link and signs in with it, once", async () => {
    const { page, context } = await newPage(browser, "phone");
    await page.goto("/sign-in");
    await page.getByRole("link", { name: "E-mail me a sign-in link" }).click();
    await page.waitForURL(/\/sign-in\/link$/);
    const before = mailFiles();
    await page.getByLabel("E-mail").fill(HOMEOWNER);
    await page.getByRole("button", { name: "E-mail me a sign-in link" }).click();
    await page.getByTestId("form-message").getByText("If that address has an account, a link is on its way.", { exact: false }).waitFor();
    expect(await page.getByLabel("E-mail").inputValue()).toBe(HOMEOWNER);
    await snap(page, "sign-in-link-sent-phone");

    const link = await linkFromMail(HOMEOWNER, /http:\/\/127\.0\.0\.1:\d+\/welcome\/link\/[A-Za-z0-9_-]{43}/, before);
    await page.goto(link);
    await page.getByRole("heading", { name: "Sign in, Eleanor" }).waitFor();
    await snap(page, "link-sign-in-phone");
    await page.getByRole("button", { name: "Sign in and continue" }).click();
    await page.waitForURL(/\/portal$/);
    await signOut(page);
    await page.goto(link);
    await page.getByRole("heading", { name: "This sign-in link has already been used" }).waitFor();
    const bogus = await page.goto("/welcome/not-a-real-token");
    expect(bogus?.status()).toBe(200);
    await page.getByRole("heading", { name: "This invitation link is not valid" }).waitFor();
    await context.close();
  });
});
