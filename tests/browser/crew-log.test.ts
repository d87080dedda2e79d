// The install day on a 390 px phone: the installer opens Today → job 1006's crew log, acknowledges the
// safety prompt, logs two walls (one over 1.3× expected → the overfill warning), keeps an entry through
// a dropped connection, records a test-out offline (and once only, though its first answer is lost);
// then the auditor sees the log and the measured result.
import type { Browser, Page } from "playwright-core";
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

type Wall = { surfaceId: string; name: string; expected: { bags: number } };

/** Every button and input on the page that a gloved thumb must hit: at least 48 px tall. */
async function smallTargets(page: Page, scope: string) {
  return page.locator(`${scope} button:visible, ${scope} input[inputmode]:visible`).evaluateAll((els) =>
    els.map((e) => ({ text: (e.textContent || e.getAttribute("aria-label") || "").trim(), h: e.getBoundingClientRect().height })).filter((x) => x.h < 48),
  );
}

describe("crew log on a phone", () => {
  it("installer logs two walls, sees the overfill warning, survives offline, records a test-out; the auditor sees it", async () => {
    // The seed leaves job 1006 at Assessed; the auditor moves it to Installing first.
    const office = await newPage(browser, "phone");
    await signInAs(office.page, "auditor@kestrelbay.example");
    await office.page.waitForURL(/\/jobs$/);
    const { job } = await (await office.page.request.get(`/api/jobs/${demoJobId}`)).json();
    const patched = await office.page.request.patch(`/api/jobs/${demoJobId}`, { data: { version: job.version, stage: "installing" } });
    expect(patched.status()).toBe(200);

    const { page, context } = await newPage(browser, "phone");
    await signInAs(page, "installer@kestrelbay.example");
    await page.waitForURL(/\/jobs$/);
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Today" }).click();
    await page.getByRole("heading", { name: "Today", exact: true }).waitFor();
    const card = page.getByTestId("today-job").filter({ hasText: "Job #1006" });
    await snap(page, "crew-today-phone");
    await card.click();
    await page.getByRole("heading", { name: "Crew log", exact: true }).waitFor();

    // Safety first: nothing to log until every caution is ticked and acknowledged.
    const prompt = page.getByTestId("safety-prompt");
    await prompt.waitFor();
    await expect(page.getByTestId("wall-card").count()).resolves.toBe(0);
    const ack = page.getByRole("button", { name: "I have read these" });
    await expect(ack.isDisabled()).resolves.toBe(true);
    await expect(prompt.textContent()).resolves.toMatch(/lead-safe work practices/);
    await expect(prompt.textContent()).resolves.toMatch(/local codes/);
    await snap(page, "crew-safety-phone");
    for (const box of await prompt.getByRole("checkbox").all()) await box.check();
    await ack.click();
    await page.getByTestId("wall-card").first().waitFor();

    const { walls } = (await (await page.request.get(`/api/jobs/${demoJobId}/crew-log`)).json()) as { walls: Wall[] };
    expect(walls.length).toBeGreaterThanOrEqual(2);
    const [a, b] = walls as [Wall, Wall];

    // Wall A: typed, a decimal, over 1.3× expected → the overfill warning appears at once.
    const wallA = page.locator(`[data-testid="wall-card"][data-wall="${a.name}"]`);
    const overBags = Math.ceil(a.expected.bags * 1.4 * 2) / 2;
    await wallA.getByLabel("Bags blown (this entry)", { exact: true }).fill(String(overBags));
    await wallA.getByLabel("Holes drilled (this entry)", { exact: true }).fill("30");
    await wallA.getByTestId("preview-warning").waitFor();
    await wallA.getByRole("button", { name: `Save entry for ${a.name}` }).click();
    await wallA.getByTestId("overfill-warning").waitFor();
    await expect(wallA.getByTestId("overfill-warning").textContent()).resolves.toMatch(/Material may be escaping into an attic, chase, soffit or basement — stop and look/);
    await expect(wallA.getByTestId("tally-bags").textContent()).resolves.toBe(String(Math.round(overBags * 10) / 10));
    await page.getByTestId("sync-status").getByText("All entries saved.").waitFor();
    await wallA.getByTestId("overfill-warning").scrollIntoViewIfNeeded();
    await snap(page, "crew-overfill-phone");

    // Wall B: with the steppers (+1 ×3, +0.5, holes +5 ×2), within range, marked finished.
    const wallB = page.locator(`[data-testid="wall-card"][data-wall="${b.name}"]`);
    for (let i = 0; i < 3; i++) await wallB.getByRole("button", { name: "Bags blown (this entry) plus 1" }).click();
    await wallB.getByRole("button", { name: "Bags blown (this entry) plus 0.5" }).click();
    for (let i = 0; i < 2; i++) await wallB.getByRole("button", { name: "Holes drilled (this entry) plus 5" }).click();
    await expect(wallB.getByLabel("Bags blown (this entry)", { exact: true }).inputValue()).resolves.toBe("3.5");
    await wallB.getByRole("button", { name: `Save entry for ${b.name}` }).click();
    await expect.poll(() => wallB.getByTestId("tally-bags").textContent()).toBe("3.5");
    await expect.poll(() => wallB.getByTestId("logged-entry").count()).toBe(1); // read back from the server

    // A dropped connection: the entry stays on the phone as pending, and goes by itself when back online.
    await context.setOffline(true);
    await wallB.getByRole("button", { name: "Bags blown (this entry) plus 1" }).click();
    await wallB.getByRole("button", { name: `Save entry for ${b.name}` }).click();
    await wallB.getByTestId("wall-pending").waitFor();
    await page.getByTestId("sync-status").getByText(/1 entry pending on this phone — offline/).waitFor();
    await expect(wallB.getByTestId("tally-bags").textContent()).resolves.toBe("4.5");
    await wallB.getByText("Entries (2)").click();
    await wallB.getByTestId("pending-entry").waitFor();
    await snap(page, "crew-pending-phone");
    await context.setOffline(false);
    await page.getByTestId("sync-status").getByText("All entries saved.").waitFor({ timeout: 30_000 });

    // A failing server: the entry survives a reload and goes with the retry button.
    await page.route("**/api/jobs/*/crew-log", (route) => (route.request().method() === "POST" ? route.fulfill({ status: 503, body: "{}" }) : route.fallback()));
    const rest = Math.round((b.expected.bags - 4.5) * 100) / 100;
    await wallB.getByLabel("Bags blown (this entry)", { exact: true }).fill(String(rest));
    await wallB.getByText("Wall finished").click();
    await wallB.getByRole("button", { name: `Save entry for ${b.name}` }).click();
    await page.getByTestId("sync-status").getByText(/1 entry pending on this phone/).waitFor();
    await page.reload();
    await page.getByTestId("sync-status").getByText(/1 entry pending on this phone/).waitFor();
    await wallB.getByTestId("wall-pending").waitFor();
    await page.unroute("**/api/jobs/*/crew-log");
    await page.getByRole("button", { name: "Retry now" }).click();
    await page.getByTestId("sync-status").getByText("All entries saved.").waitFor();
    await expect.poll(() => wallB.getByTestId("tally-bags").textContent()).toBe(String(Math.round(b.expected.bags * 10) / 10));
    await expect(wallB.getByText("Finished", { exact: true }).count()).resolves.toBe(1);
    await expect(wallB.getByTestId("underfill-warning").count()).resolves.toBe(0);
    const log = (await (await page.request.get(`/api/jobs/${demoJobId}/crew-log`)).json()) as { walls: (Wall & { logged: { entries: number } })[] };
    expect(log.walls.find((w) => w.surfaceId === b.surfaceId)!.logged.entries).toBe(3); // no duplicates from the resends

    const tooSmall = await smallTargets(page, "[data-testid=wall-form]");
    expect(tooSmall).toEqual([]);

    // Test-out: a bad value keeps its message, then the real reading moves the job to Verified.
    const form = page.getByTestId("test-out-form");
    await form.getByLabel("CFM50").fill("0");
    await form.getByRole("button", { name: "Record test-out" }).click();
    await form.getByText(/CFM50 must be between/).waitFor();
    await form.getByLabel("CFM50").fill("2350");
    await form.getByLabel("Outdoor temperature (°F)").fill("38");
    await form.getByLabel("Wind (mph)").fill("6");
    await form.getByLabel("Notes (optional)").fill("Attic hatch weatherstripped; furnace draft checked.");

    // Recorded in a basement with no signal: the reading waits on the phone, shown as pending.
    await context.setOffline(true);
    await form.getByRole("button", { name: "Record test-out" }).click();
    const pendingTestOut = form.getByTestId("test-out-pending");
    await pendingTestOut.getByText(/Test-out pending on this phone — offline/).waitFor();
    await expect(pendingTestOut.textContent()).resolves.toMatch(/2,350 CFM50/);
    await expect(form.getByLabel("CFM50").inputValue()).resolves.toBe("2350"); // what was typed stays on screen
    await pendingTestOut.scrollIntoViewIfNeeded();
    await snap(page, "crew-test-out-pending-phone");
    await expect(smallTargets(page, "[data-testid=test-out-form]")).resolves.toEqual([]);

    // Back online, but the first answer is lost on the way (a gateway times out after the server
    // has stored the reading): the phone keeps it pending; the next send is answered from the stored one.
    let lostAnswers = 0;
    await page.route("**/api/jobs/*/test-out", async (route) => {
      lostAnswers++;
      if (lostAnswers === 1) {
        const reached = await route.fetch(); // reaches the server and records the reading …
        expect(reached.status()).toBe(201);
      }
      await route.fulfill({ status: 504, contentType: "application/json", body: "{}" }); // … but the phone hears only a timeout
    });
    await context.setOffline(false);
    const timedOut = pendingTestOut.getByTestId("test-out-pending-reason").getByText(/did not take it \(504\)/);
    await timedOut.waitFor({ timeout: 30_000 });
    // Still pending after a reload: the reading lives on the phone, and the reloaded page sends it again.
    await page.reload();
    await pendingTestOut.waitFor();
    await expect(form.getByLabel("CFM50").inputValue()).resolves.toBe("2350");
    await timedOut.waitFor({ timeout: 30_000 });
    expect(lostAnswers).toBeGreaterThanOrEqual(2);
    await page.unroute("**/api/jobs/*/test-out");
    await pendingTestOut.getByRole("button", { name: "Send now" }).click();
    await form.getByText("Test-out recorded. The job is now Verified.").waitFor();
    await expect(form.getByTestId("test-out-pending").count()).resolves.toBe(0);
    await expect(form.getByLabel("CFM50").inputValue()).resolves.toBe(""); // a fresh form for a later reading
    await expect.poll(() => page.getByTestId("measured-cfm50").textContent()).toBe("2,350");
    const assessment = (await (await office.page.request.get(`/api/jobs/${demoJobId}/assessment`)).json()) as { doc: { leakage: { tests: { phase: string; cfm50: number }[] } } };
    expect(assessment.doc.leakage.tests.filter((t) => t.phase === "test-out").map((t) => t.cfm50)).toEqual([2350]); // one reading, not two
    await page.getByTestId("test-out-result").scrollIntoViewIfNeeded();
    await snap(page, "crew-test-out-phone");
    await context.close();

    // The office: the same log read-only, the summary with the warning, and the measured result.
    await office.page.goto(`/jobs/${demoJobId}/crew`);
    await office.page.getByTestId("crew-summary").waitFor();
    await expect(office.page.getByTestId("wall-form").count()).resolves.toBe(0);
    await expect(office.page.getByTestId("safety-prompt").count()).resolves.toBe(0);
    await office.page.locator(`[data-testid="wall-card"][data-wall="${a.name}"]`).getByTestId("overfill-warning").waitFor();
    await expect(office.page.getByTestId("crew-summary").textContent()).resolves.toMatch(new RegExp(`${a.name}: overfill`));
    await expect(office.page.getByTestId("crew-summary").textContent()).resolves.toMatch(/Dario Mendel-Quist/);
    await expect(office.page.getByTestId("measured-cfm50").textContent()).resolves.toBe("2,350");
    await expect(office.page.getByTestId("test-out-result").textContent()).resolves.toMatch(/\$/);
    await expect(office.page.getByText("Verified", { exact: true }).first().isVisible()).resolves.toBe(true);
    await snap(office.page, "crew-office-phone");
    await office.context.close();
  });
});
