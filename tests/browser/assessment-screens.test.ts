// Screenshots of each assessment screen of the fully entered demo job, at 1280 px and 390 px,
// for people to look at (tests/browser/.artifacts/screen-*.png). The checks are that each screen
// is there and nothing on it is wider than the viewport (no sideways scrolling of the page).
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInAs } from "./support/browser";
import path from "node:path";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const screens = [
  ["house", "House"],
  ["surfaces", "Surfaces"],
  ["stacks", "Layer stacks"],
  ["leakage", "Air leakage"],
  ["upgrades", /Upgrades, in the order/],
] as const;

describe.each(["desktop", "phone"] as const)("assessment screens at %s size", (size) => {
  it("shows every screen of the demo job without pushing the page sideways", async () => {
    const { page, context } = await newPage(browser, size);
    await signInAs(page, "auditor@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    await page.getByRole("link", { name: "#1006" }).click();
    await page.getByRole("link", { name: "Assessment" }).click();
    await page.getByTestId("results-yearly-saving").waitFor();
    await page.locator(".recharts-wrapper").first().waitFor();
    for (const [name, heading] of screens) {
      const section = page.locator("section").filter({ has: page.getByRole("heading", { name: heading, level: 2 }) }).first();
      await section.scrollIntoViewIfNeeded();
      await section.screenshot({ path: path.join(__dirname, ".artifacts", `screen-${name}-${size}.png`) });
    }
    if (size === "desktop") {
      // The rest of the surfaces table, scrolled sideways (the label column stays in view).
      const table = page.getByTestId("surface-table");
      await table.evaluate((el) => el.scrollTo({ left: el.scrollWidth }));
      await page.locator("section").filter({ has: page.getByRole("heading", { name: "Surfaces", level: 2 }) }).screenshot({ path: path.join(__dirname, ".artifacts", "screen-surfaces-scrolled-desktop.png") });
    }
    // The results column scrolls on its own on a desktop; let it run full length for the picture.
    await page.addStyleTag({ content: "[data-testid=results]{max-height:none!important;overflow:visible!important;position:static!important}" });
    await page.getByTestId("results").screenshot({ path: path.join(__dirname, ".artifacts", `screen-results-${size}.png`) });
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await context.close();
  });
});
