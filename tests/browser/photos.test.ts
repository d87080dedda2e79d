import type { Browser } from "playwright-core";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoJobId } from "@/db/seed-scenario";
import { launch, newPage, signInAs, snap } from "./support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const photo = (background: string) =>
  sharp({ create: { width: 1600, height: 1200, channels: 3, background, noise: { type: "gaussian", mean: 128, sigma: 25 } } })
    .jpeg({ quality: 85 })
    .withExif({ IFD0: { Make: "TestCam" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "40/1 26/1 0/1", GPSLongitudeRef: "W", GPSLongitude: "74/1 1/1 0/1" } })
    .toBuffer();

describe("job photos", () => {
  it("uploads before and after photos as the auditor and shows them side by side", async () => {
    const { page, context } = await newPage(browser, "desktop");
    await signInAs(page, "auditor@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    await page.goto(`/jobs/${demoJobId}/photos`);
    await page.getByRole("heading", { name: "Photos", exact: true }).waitFor();
    await page.getByText("No photos on this job yet.").waitFor();

    const input = page.getByTestId("photo-file-input");
    await page.getByLabel("Caption (optional)").fill("North wall from the street, before");
    await input.setInputFiles({ name: "IMG_0412.JPG", mimeType: "image/jpeg", buffer: await photo("#7a6a58") });
    await page.getByTestId("upload-list").getByText("Uploaded").waitFor();
    await page.getByTestId("photo-card").first().waitFor();

    await page.getByText("After", { exact: true }).first().click();
    await page.getByLabel("Caption (optional)").fill("Same wall after dense-pack, holes plugged");
    await input.setInputFiles({ name: "IMG_0519.JPG", mimeType: "image/jpeg", buffer: await photo("#8c7b66") });
    await page.getByTestId("before-after").waitFor();
    await expect(page.getByTestId("photo-grid").getByTestId("photo-card").count()).resolves.toBe(2);

    // a renamed text file is refused before it is sent
    await input.setInputFiles({ name: "notes.jpg", mimeType: "image/jpeg", buffer: Buffer.from("these are notes, not a photo at all, sorry") });
    await expect(page.getByTestId("upload-error").first().textContent()).resolves.toMatch(/not a JPEG, PNG or WebP/);

    // thumbnails load (the images have a natural size)
    const widths = await page.getByTestId("photo-grid").locator("img").evaluateAll((imgs) => imgs.map((i) => (i as HTMLImageElement).naturalWidth));
    expect(widths).toEqual([480, 480]);
    await snap(page, "photos-desktop");

    await page.getByRole("button", { name: "Thermal" }).click();
    await page.getByText("No photos match this filter.").waitFor();
    await context.close();
  });

  it("works on a phone for the assigned installer", async () => {
    const { page, context } = await newPage(browser, "phone");
    await signInAs(page, "installer@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    await page.goto(`/jobs/${demoJobId}/photos`);
    await page.getByRole("button", { name: "Take photo" }).waitFor();
    await page.getByTestId("photo-file-input").setInputFiles({ name: "wall.jpg", mimeType: "image/jpeg", buffer: await photo("#6b5a48") });
    await page.getByTestId("upload-list").getByText("Uploaded").waitFor();
    await expect(page.locator('input[capture="environment"]').count()).resolves.toBe(1);
    await snap(page, "photos-phone");
    await context.close();
  });
});
