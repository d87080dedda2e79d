import path from "node:path";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { inject } from "vitest";

const executablePath = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

export const baseURL = () => inject("baseURL");

// Playwright gives each launch a fresh temporary profile (it refuses --user-data-dir with launch()).
export async function launch(): Promise<Browser> {
  return chromium.launch({
    executablePath,
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
}

export const viewports = {
  desktop: { width: 1280, height: 900 },
  phone: { width: 390, height: 844 },
} as const;

export async function newPage(browser: Browser, viewport: keyof typeof viewports = "desktop"): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ baseURL: baseURL(), viewport: viewports[viewport] });
  const page = await context.newPage();
  return { context, page };
}

/** Screenshots for people to look at: tests/browser/.artifacts/NAME.png (not committed). */
export async function snap(page: Page, name: string) {
  await page.screenshot({ path: path.join(__dirname, "..", ".artifacts", `${name}.png`), fullPage: true });
}

export const DEMO_PASSWORD = "warmstead-demo";

export async function signInAs(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}
