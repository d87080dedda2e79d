// The demo house fully entered (calc's demoHouseInput), so a newcomer sees complete results at once.
import { eq } from "drizzle-orm";
import { analyzeHouse } from "../calc/analyze";
import { demoHouseInput } from "../calc/demo";
import { MEASURE_LIFE_YEARS } from "../calc/economics";
import * as t from "./schema";
import { priceJob } from "../lib/documents/proposal-lines";
import { seedId } from "./seed-scenario";

type Tx = Parameters<Parameters<import("./index").Db["transaction"]>[0]>[0];

export async function seedDemoAssessmentRows(tx: Tx, demo: { jobId: string; companyId: string }) {
  const sid = (key: string) => seedId(`surface:1006:${key}`);
  const rows: (typeof t.surfaces.$inferInsert)[] = [];
  demoHouseInput.surfaces.forEach((s, i) => {
    rows.push({
      id: sid(s.id), jobId: demo.jobId, label: s.name, kind: s.kind, orientation: s.orientation, grossAreaFt2: s.grossAreaFt2, position: i,
      assemblyKey: s.assemblyKey, heightFt: "heightFt" in s ? s.heightFt : null, bufferFactor: "bufferFactor" in s ? s.bufferFactor : null,
      blockedBayFraction: "blockedBayFraction" in s ? s.blockedBayFraction : null,
    });
    const openings: readonly { kind: "window" | "door"; areaFt2: number; count?: number; productKey: string }[] = ("openings" in s && s.openings) || [];
    openings.forEach((o, j) => {
      rows.push({
        id: sid(`${s.id}:opening:${j}`), jobId: demo.jobId, parentSurfaceId: sid(s.id), label: o.kind === "window" ? `${s.name} windows` : `${s.name} door`,
        kind: o.kind, orientation: s.orientation, grossAreaFt2: o.areaFt2, position: j, openingCount: o.count ?? 1, productKey: o.productKey,
      });
    });
  });
  await tx.insert(t.surfaces).values(rows).onConflictDoNothing();
  // Each upgrade's cost is priced from the company's price book, as the workspace prices it
  // (the server prices it again on every load, so a changed price book shows at once).
  const items = await tx.select().from(t.priceBookItems).where(eq(t.priceBookItems.companyId, demo.companyId));
  const upgradeIds = demoHouseInput.upgrades.map((_, i) => seedId(`upgrade:1006:${i}`));
  const pricing = priceJob(demoHouseInput.upgrades.map((u, i) => ({ ...u, id: upgradeIds[i]! })), analyzeHouse(demoHouseInput), items);
  await tx
    .insert(t.upgrades)
    .values(
      demoHouseInput.upgrades.map((u, i) => ({
        id: upgradeIds[i]!, jobId: demo.jobId, type: u.type, name: u.name, position: i, costCents: pricing.upgrades[i]!.costCents,
        lifeYears: MEASURE_LIFE_YEARS[u.type],
        params: u.type === "air-sealing" ? { targetCfm50: u.targetCfm50 } : u.type === "attic-insulation" ? { targetR: u.targetRIP } : {},
      })),
    )
    .onConflictDoNothing();
}
