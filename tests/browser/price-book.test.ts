import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInAs, snap } from "./support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

async function openPriceBook(page: Page, email: string) {
  await signInAs(page, email);
  await page.waitForURL(/\/jobs$/);
  await page.getByRole("link", { name: "Price book" }).click();
  await page.waitForURL(/\/price-book$/);
  await page.getByRole("heading", { name: "Price book", exact: true }).waitFor();
}

describe("price book", () => {
  it("the owner adds an item with a bad price, sees why beside the field with the rest kept, fixes it and sees it listed", async () => {
    const { page, context } = await newPage(browser);
    await openPriceBook(page, "owner@kestrelbay.example");
    await page.getByTestId("item-CEL-BAG").getByText("$16.50").waitFor();
    await expect(page.getByTestId("price-book-rows").locator("tr").count()).resolves.toBe(7);

    // The sales tax rate keeps thousandths of a percent; a rate with too many decimals is refused beside the field.
    const tax = page.getByTestId("tax-rate-form");
    await tax.getByTestId("tax-rate").getByText("6.625 %").waitFor();
    await tax.getByLabel("Sales tax rate (%)").fill("6.62501");
    await tax.getByRole("button", { name: "Save rate" }).click();
    await tax.getByTestId("error-taxRatePercent").getByText("Sales tax rate can have at most four decimal places (e.g. 6.6250).").waitFor();
    await expect(tax.getByLabel("Sales tax rate (%)").inputValue()).resolves.toBe("6.62501");
    await tax.getByLabel("Sales tax rate (%)").fill("7.125");
    await tax.getByRole("button", { name: "Save rate" }).click();
    await tax.getByTestId("tax-rate").getByText("7.125 %").waitFor();
    expect((await (await page.request.get("/api/price-book/tax-rate")).json()).taxRatePpm).toBe(71_250);
    await tax.getByLabel("Sales tax rate (%)").fill("6.625");
    await tax.getByRole("button", { name: "Save rate" }).click();
    await tax.getByTestId("tax-rate").getByText("6.625 %").waitFor();

    const add = page.getByTestId("add-item-form");
    await add.getByLabel("Code").fill("vapour-paint");
    await add.getByLabel("Name").fill("Vapour-retarder primer, ceilings");
    await add.getByLabel("Kind").selectOption("material");
    await add.getByLabel("Unit", { exact: true }).selectOption("ft2");
    await add.getByLabel("Unit price").fill("0.455");
    await add.getByLabel("Taxable").uncheck();
    await add.getByRole("button", { name: "Add item" }).click();

    await add.getByTestId("error-unitPrice").getByText("Unit price can have at most two decimal places (whole cents).").waitFor();
    await expect(add.getByLabel("Unit price").getAttribute("aria-invalid")).resolves.toBe("true");
    await expect(add.getByLabel("Code").inputValue()).resolves.toBe("vapour-paint");
    await expect(add.getByLabel("Name").inputValue()).resolves.toBe("Vapour-retarder primer, ceilings");
    await expect(add.getByLabel("Kind").inputValue()).resolves.toBe("material");
    await expect(add.getByLabel("Unit", { exact: true }).inputValue()).resolves.toBe("ft2");
    await expect(add.getByLabel("Unit price").inputValue()).resolves.toBe("0.455");
    await expect(add.getByLabel("Taxable").isChecked()).resolves.toBe(false);
    await expect(add.getByTestId("error-code").textContent()).resolves.toBe("");
    await snap(page, "price-book-add-error-desktop");

    // A code the company already uses is refused by the server, and shown beside the code.
    await add.getByLabel("Unit price").fill("0.45");
    await add.getByLabel("Code").fill("cel-bag");
    await add.getByRole("button", { name: "Add item" }).click();
    await add.getByTestId("error-code").getByText(/Code CEL-BAG is already used by “Dense-pack cellulose”/).waitFor();
    await expect(add.getByTestId("error-unitPrice").textContent()).resolves.toBe("");
    await expect(add.getByLabel("Name").inputValue()).resolves.toBe("Vapour-retarder primer, ceilings");

    await add.getByLabel("Code").fill("vapour-paint");
    await add.getByRole("button", { name: "Add item" }).click();
    await add.getByTestId("form-message").getByText("Added VAPOUR-PAINT, Vapour-retarder primer, ceilings, at $0.45 per ft².").waitFor();
    const row = page.getByTestId("item-VAPOUR-PAINT");
    await row.getByText("$0.45").waitFor();
    await expect(row.textContent()).resolves.toMatch(/Material.*ft².*\$0\.45.*No.*Active/);
    await expect(add.getByLabel("Code").inputValue()).resolves.toBe("");

    // Inline edit: a bad price stays in the row with its reason; a good one is saved.
    const cellulose = page.getByTestId("item-CEL-BAG");
    await cellulose.getByRole("button", { name: "Edit CEL-BAG" }).click();
    await cellulose.getByLabel("Unit price").fill("-17");
    await cellulose.getByRole("button", { name: "Save" }).click();
    await cellulose.getByTestId("error-unitPrice").getByText("Unit price cannot be negative.").waitFor();
    await expect(cellulose.getByLabel("Unit price").inputValue()).resolves.toBe("-17");
    await snap(page, "price-book-edit-error-desktop");
    await cellulose.getByLabel("Unit price").fill("17.25");
    await cellulose.getByRole("button", { name: "Save" }).click();
    await page.getByTestId("item-message-CEL-BAG").getByText("Saved CEL-BAG.").waitFor();
    await page.getByTestId("item-CEL-BAG").getByText("$17.25").waitFor();

    // Retire an item instead of deleting it; it can come back.
    await page.getByRole("button", { name: "Deactivate PERMIT" }).click();
    await page.getByTestId("item-PERMIT").getByText("Inactive", { exact: true }).waitFor();
    await expect(page.getByTestId("price-book-count").textContent()).resolves.toBe("8 items, 1 inactive");
    await snap(page, "price-book-owner-desktop");

    // What the page shows is what the API stores.
    const api = await (await page.request.get("/api/price-book")).json();
    const byCode = Object.fromEntries(api.items.map((i: { code: string }) => [i.code, i]));
    expect(byCode["VAPOUR-PAINT"]).toMatchObject({ unitPriceCents: 45, unit: "ft2", kind: "material", taxable: false, active: true });
    expect(byCode["CEL-BAG"].unitPriceCents).toBe(1725);
    expect(byCode.PERMIT.active).toBe(false);

    await page.getByRole("button", { name: "Reactivate PERMIT" }).click();
    await page.getByTestId("item-PERMIT").getByText("Active", { exact: true }).waitFor();
    await context.close();
  });

  it("on a phone the owner's table becomes a list of cards", async () => {
    const { page, context } = await newPage(browser, "phone");
    await openPriceBook(page, "owner@kestrelbay.example");
    const card = page.getByTestId("item-LAB-INS");
    await card.getByText("$85.00").waitFor();
    // Each card spans the screen, one under another, with its column names shown inside it.
    const box = (await card.boundingBox())!;
    const next = (await page.getByTestId("item-PERMIT").boundingBox())!;
    expect(box.width).toBeGreaterThan(300);
    expect(next.y).toBeGreaterThan(box.y + box.height - 1);
    await expect(page.locator("html").evaluate((el) => el.scrollWidth <= el.clientWidth)).resolves.toBe(true);
    await snap(page, "price-book-owner-phone");
    await card.getByRole("button", { name: "Edit LAB-INS" }).click();
    await card.getByLabel("Unit price").fill("abc");
    await card.getByRole("button", { name: "Save" }).click();
    await card.getByTestId("error-unitPrice").getByText("Unit price must be an amount in dollars, e.g. 12.50.").waitFor();
    await snap(page, "price-book-edit-error-phone");
    await card.getByRole("button", { name: "Cancel" }).click();
    await page.getByTestId("add-item-form").getByLabel("Unit price").fill("-1");
    await page.getByTestId("add-item-form").getByRole("button", { name: "Add item" }).click();
    await page.getByTestId("add-item-form").getByTestId("error-unitPrice").getByText("Unit price cannot be negative.").waitFor();
    await page.getByTestId("add-item-form").scrollIntoViewIfNeeded();
    await snap(page, "price-book-add-error-phone");
    await context.close();
  });

  it("an auditor reads the price book without controls to change it", async () => {
    const { page, context } = await newPage(browser);
    await openPriceBook(page, "auditor@kestrelbay.example");
    await page.getByTestId("item-AIR-SEAL").getByText("$95.00").waitFor();
    await expect(page.getByTestId("add-item-form").count()).resolves.toBe(0);
    await expect(page.getByRole("button", { name: /^(Edit|Deactivate|Reactivate) / }).count()).resolves.toBe(0);
    await page.getByText("Prices are set by the company owner").waitFor();
    await snap(page, "price-book-auditor-desktop");
    // Hiding controls is not the protection: the API refuses the change too.
    const res = await page.request.post("/api/price-book", { data: { code: "SNEAK", name: "Sneak", kind: "other", unit: "each", unitPrice: "1" } });
    expect(res.status()).toBe(403);
    await context.close();

    const phone = await newPage(browser, "phone");
    await openPriceBook(phone.page, "auditor2@kestrelbay.example");
    await phone.page.getByTestId("item-AIR-SEAL").getByText("$95.00").waitFor();
    await snap(phone.page, "price-book-auditor-phone");
    await phone.context.close();
  });

  it("an installer has no price book link, is redirected from the page and refused by the API", async () => {
    const { page, context } = await newPage(browser, "phone");
    await signInAs(page, "installer@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    await expect(page.getByRole("link", { name: "Price book" }).count()).resolves.toBe(0);
    await page.goto("/price-book");
    expect(page.url()).toMatch(/\/jobs\?denied=1$/);
    expect((await page.request.get("/api/price-book")).status()).toBe(403);
    await context.close();
  });
});
