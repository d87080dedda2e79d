import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { analyzeHouse } from "@/calc";
import * as f from "@/components/assessment/results/format";
import { toHouseInput } from "@/lib/assessment/to-house-input";
import { createJob, saved, serverDoc } from "./support/assessment";
import { launch, newPage, signInAs, snap } from "./support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const activePath = () => (document.activeElement as HTMLElement | null)?.getAttribute("data-path") ?? (document.activeElement as HTMLElement | null)?.textContent;

describe("surfaces table", () => {
  it("adds, duplicates, deletes with undo in place, bulk-sets layer stacks and totals the rows, from the keyboard where it matters", async () => {
    const { page, context } = await newPage(browser);
    await signInAs(page, "auditor@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    const jobId = await createJob(page, "56");
    await page.goto(`/jobs/${jobId}/assessment`);
    await page.getByRole("heading", { name: "Surfaces" }).waitFor();
    await page.getByLabel("Where the degree days come from").selectOption("station");
    await page.getByLabel("Weather station").selectOption("725020");
    await page.getByRole("button", { name: "Add a blower-door reading" }).click();
    await page.getByTestId("leakage-0").getByLabel("CFM50").fill("2900");

    const table = page.getByTestId("surface-table");
    for (const [i, name] of ["Front wall", "Side wall", "Back wall"].entries()) {
      await page.getByRole("button", { name: "Add wall" }).click();
      // The new row's label takes the focus, so the auditor can type straight away.
      await page.waitForFunction((p) => document.activeElement?.getAttribute("data-path") === p, `surfaces.${i}.name`);
      await page.keyboard.press("ControlOrMeta+a");
      await page.keyboard.type(name);
      await table.getByTestId(`surface-${i}`).getByLabel("Gross area (ft²)").fill(String(300 + i * 50));
    }
    await expect(table.locator("tbody tr").count()).resolves.toBe(3);

    // Duplicate: the copy sits right below its original and takes the focus.
    await table.getByRole("button", { name: "Duplicate “Front wall”" }).click();
    await page.waitForFunction(() => document.activeElement?.getAttribute("data-path") === "surfaces.1.name");
    await expect(table.getByTestId("surface-1").getByLabel("Label").inputValue()).resolves.toBe("Front wall (copy)");
    await expect(table.getByTestId("surface-1").getByLabel("Gross area (ft²)").inputValue()).resolves.toBe("300");

    // Delete the second row, then undo from the keyboard: it comes back in place.
    await table.getByRole("button", { name: "Delete “Side wall”" }).focus();
    await page.keyboard.press("Enter");
    await page.getByTestId("surface-undo").getByText("Deleted “Side wall”.").waitFor();
    await expect(table.locator("tbody tr").count()).resolves.toBe(3);
    expect(await page.evaluate(activePath)).toBe("Undo");
    await page.keyboard.press("Enter");
    await expect(table.locator("tbody tr").count()).resolves.toBe(4);
    await expect(table.getByTestId("surface-2").getByLabel("Label").inputValue()).resolves.toBe("Side wall");
    await expect(table.getByTestId("surface-2").getByLabel("Gross area (ft²)").inputValue()).resolves.toBe("350");
    await expect(page.getByTestId("surface-undo").count()).resolves.toBe(0);

    // A ceiling, then bulk: select two walls and the ceiling with the keyboard, set a wall stack (the ceiling is skipped).
    await page.getByRole("button", { name: "Add ceiling" }).click();
    await table.getByTestId("surface-4").getByLabel("Gross area (ft²)").fill("800");
    for (const name of ["Front wall", "Back wall", "New ceiling"]) {
      await table.getByRole("checkbox", { name: `Select “${name}”` }).focus();
      await page.keyboard.press("Space");
    }
    const bulk = page.getByTestId("surface-bulk");
    await bulk.getByText("3 surfaces selected").waitFor();
    await bulk.getByLabel("Existing layer stack for the selected").selectOption("wall-2x4-r13");
    await bulk.getByRole("button", { name: "Set existing" }).click();
    await bulk.getByText("Existing layer stack set on 2 surfaces; 1 surface of another kind left as they were.").waitFor();
    await expect(table.getByTestId("surface-0").getByLabel("Existing layer stack").inputValue()).resolves.toBe("wall-2x4-r13");
    await expect(table.getByTestId("surface-3").getByLabel("Existing layer stack").inputValue()).resolves.toBe("wall-2x4-r13");
    await expect(table.getByTestId("surface-1").getByLabel("Existing layer stack").inputValue()).resolves.not.toBe("wall-2x4-r13");

    // Proposed: a dense-pack upgrade covers every wall; bulk "No change" on one takes it out of that upgrade.
    await page.getByRole("button", { name: "Add dense-pack walls" }).click();
    await bulk.getByRole("button", { name: "Clear selection" }).click();
    await table.getByRole("checkbox", { name: "Select “Front wall (copy)”" }).check();
    await page.getByTestId("surface-bulk").getByLabel("Proposed for the selected").selectOption("none");
    await page.getByTestId("surface-bulk").getByRole("button", { name: "Set proposed" }).click();
    await expect(table.getByTestId("surface-1").getByLabel("Proposed layer stack").inputValue()).resolves.toBe("none");
    const dense = await table.getByTestId("surface-0").getByLabel("Proposed layer stack").inputValue();
    expect(dense).not.toBe("none");
    await saved(page);

    const { doc } = await serverDoc(page, jobId);
    expect(doc.surfaces.map((s) => s.name)).toEqual(["Front wall", "Front wall (copy)", "Side wall", "Back wall", "New ceiling"]);
    const upgrade = doc.upgrades.find((u) => u.type === "dense-pack-walls")!;
    expect(upgrade.id).toBe(dense);
    expect(upgrade.surfaceIds).toEqual([doc.surfaces[0]!.id, doc.surfaces[2]!.id, doc.surfaces[3]!.id]);

    // Totals row: areas from the rows, UA from calc on the saved document.
    const a = analyzeHouse(toHouseInput(doc));
    await page.getByTestId("surface-totals").getByText(`${f.num(300 + 300 + 350 + 400 + 800)} ft²`, { exact: true }).waitFor();
    await expect(page.getByTestId("surface-totals-ua").textContent()).resolves.toBe(`UA ${f.num(a.baseline.envelope.totalUA, 1)}→ ${f.num(a.final.envelope.totalUA, 1)}`);
    const row0 = a.baseline.envelope.surfaces[0]!;
    await expect(table.getByTestId("surface-0").getByTestId("surface-figures").textContent()).resolves.toContain(`UA ${f.num(row0.totalUA, 1)} → ${f.num(a.final.envelope.surfaces[0]!.totalUA, 1)}`);

    // Openings: the row's button opens the editor below it.
    await table.getByRole("button", { name: "Windows and doors in “Back wall”: none" }).click();
    await page.getByTestId("surface-3-openings").getByRole("button", { name: "Add window" }).click();
    await table.getByRole("button", { name: "Windows and doors in “Back wall”: 1 · 12 ft²" }).waitFor();
    await snap(page, "assessment-surfaces-table-desktop");
    await context.close();
  });

  it("stays a list of cards on a 390 px phone", async () => {
    const { page, context } = await newPage(browser, "phone");
    await signInAs(page, "auditor2@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    const jobId = await createJob(page, "78");
    await page.goto(`/jobs/${jobId}/assessment`);
    await page.getByRole("button", { name: "Add wall" }).click();
    await page.getByRole("button", { name: "Add wall" }).click();
    await page.getByTestId("surface-list").waitFor();
    await expect(page.getByTestId("surface-table").count()).resolves.toBe(0);
    await expect(page.locator("ol[data-testid=surface-list] > li").count()).resolves.toBe(2);
    await page.getByTestId("surface-1").getByRole("button", { name: "Delete “New wall”" }).click();
    await page.getByTestId("surface-undo").getByRole("button", { name: "Undo" }).click();
    await expect(page.locator("ol[data-testid=surface-list] > li").count()).resolves.toBe(2);
    await snap(page, "assessment-surfaces-cards-phone");
    await context.close();
  });

  it("keeps the IP/SI choice on the user's account: it survives a reload and another device", async () => {
    const { page, context } = await newPage(browser);
    await signInAs(page, "owner@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    await page.getByRole("link", { name: "#1006" }).click();
    await page.getByRole("link", { name: "Assessment" }).click();
    const results = page.getByTestId("results-panel");
    await results.getByText(/Btu\/h/).first().waitFor();
    try {
      await page.getByLabel("Metric (SI)").check();
      await results.getByText(/\bkW\b/).first().waitFor();
      await page.waitForFunction(async () => (await (await fetch("/api/me/preferences")).json()).unitSystem === "si");
      await page.reload();
      await expect(page.getByLabel("Metric (SI)").isChecked()).resolves.toBe(true);
      await results.getByText(/\bkW\b/).first().waitFor();
      // Another browser, same user: the choice came from the server, not this device.
      const other = await newPage(browser);
      await signInAs(other.page, "owner@kestrelbay.example");
      await other.page.waitForURL(/\/jobs$/);
      await other.page.goto(page.url());
      await expect(other.page.getByLabel("Metric (SI)").isChecked()).resolves.toBe(true);
      await other.context.close();
      await snap(page, "assessment-units-si-desktop");
    } finally {
      await page.getByLabel("US units (IP)").check();
      await page.waitForFunction(async () => (await (await fetch("/api/me/preferences")).json()).unitSystem === "ip");
    }
    await context.close();
  });
});
