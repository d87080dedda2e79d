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

describe("new job form", () => {
  it("shows each bad field's reason beside it, keeps what was typed, then creates the job", async () => {
    const { page, context } = await newPage(browser, "phone");
    await signInAs(page, "auditor@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    await page.getByRole("link", { name: "New job" }).click();
    await page.getByRole("heading", { name: "New job" }).waitFor();

    await page.getByLabel("Name").fill("Odile Brackenfield");
    await page.getByLabel("Street address").fill("48 Weatherboard Lane");
    await page.getByLabel("Town or city").fill("Harrowmere");
    await page.getByLabel("State").fill("NJ");
    await page.getByLabel("ZIP code").fill("7000");
    await page.getByLabel("Year built").fill("19O8");
    await page.getByLabel("Conditioned floor area (ft²)").fill("1350");
    await page.getByLabel("Bedrooms").fill("3");
    await page.getByRole("button", { name: "Create job" }).click();

    await page.getByTestId("error-house.yearBuilt").getByText("Year built must be a number.").waitFor();
    await expect(page.getByTestId("error-house.postalCode").textContent()).resolves.toMatch(/ZIP code must be five digits/);
    await expect(page.getByTestId("error-house.stories").textContent()).resolves.toMatch(/Choose stories/);
    await expect(page.getByTestId("error-house.volumeFt3").textContent()).resolves.toMatch(/ceiling height/);
    await expect(page.getByLabel("Name").inputValue()).resolves.toBe("Odile Brackenfield");
    await expect(page.getByLabel("Street address").inputValue()).resolves.toBe("48 Weatherboard Lane");
    await expect(page.getByLabel("Conditioned floor area (ft²)").inputValue()).resolves.toBe("1350");
    await expect(page.getByLabel("Year built").getAttribute("aria-invalid")).resolves.toBe("true");
    await snap(page, "new-job-errors-phone");

    await page.getByLabel("ZIP code").fill("07000");
    await page.getByLabel("Year built").fill("1908");
    await page.getByLabel("Stories above grade").selectOption("2");
    await page.getByLabel("Average ceiling height (ft)").fill("8");
    await page.getByLabel("Foundation").selectOption("basement");
    await page.getByRole("button", { name: "Create job" }).click();
    await page.waitForURL(/\/jobs\/[0-9a-f-]+\?created=1/);
    await page.getByRole("heading", { name: "48 Weatherboard Lane, Harrowmere" }).waitFor();
    await expect(page.getByText("10,800 ft³").count()).resolves.toBe(1);
    await context.close();
  });
});
