import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, snap } from "./support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe("landing page", () => {
  it("says what Warmstead does and links to sign-in, with security headers", async () => {
    const { page, context } = await newPage(browser);
    const res = await page.goto("/");
    expect(res?.status()).toBe(200);
    const headers = res!.headers();
    expect(headers["content-security-policy"]).toContain("frame-ancestors 'none'");
    expect(headers["x-content-type-options"]).toBe("nosniff");
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toContain("test-out");
    await snap(page, "landing-desktop");
    await page.getByRole("link", { name: "Sign in" }).click();
    await page.waitForURL(/\/sign-in/);
    await context.close();
  });
});
