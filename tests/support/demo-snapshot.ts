// A realistic issued snapshot of the demo house (PRODUCT.md's invented 1928 house) for document
// tests and benches. The company, client and address are invented. The assessment document is
// approximated from demoHouseInput: it is test data, so it is cast where its shape differs.
import { analyzeHouse, demoHouseInput } from "@/calc";
import type { AssessmentDoc } from "@/lib/assessment/doc";
import type { DocumentKind, ProposalLine, ProposalTerms, ReportSnapshot } from "@/lib/documents/snapshot";

const ISSUED_AT = Date.UTC(2025, 9, 14, 15, 30); // October 14, 2025, 11:30 in New Jersey
const TEST_IN_AT = Date.UTC(2025, 9, 2, 14, 0);
const TEST_OUT_AT = Date.UTC(2025, 10, 20, 19, 0);
const DAY = 86_400_000;

export type DemoOptions = {
  /** A test-out reading exists: the report's leakage figures are then measured. */
  measured?: boolean;
  /** Test-out CFM50 when measured (default 2,250). */
  testOutCfm50?: number;
  version?: number;
};

function line(description: string, quantity: number, unit: string, unitPriceCents: number, upgradeIndex?: number): ProposalLine {
  return { description, quantity, unit, unitPriceCents, totalCents: Math.round(quantity * unitPriceCents), ...(upgradeIndex !== undefined ? { upgradeIndex } : {}) };
}

function assessmentOf(input: typeof demoHouseInput, testOut?: number): AssessmentDoc {
  return {
    house: {
      yearBuilt: input.yearBuilt,
      stories: input.stories,
      floorAreaFt2: input.floorAreaFt2,
      volumeFt3: input.volumeFt3,
      ceilingHeightFt: 8.5,
      bedrooms: input.bedrooms,
      foundation: "basement",
      shielding: "normal",
      indoorTempF: input.indoorTempF,
      indoorRH: input.indoorRH,
      climate: input.climate,
      hazards: { knobAndTube: "unknown", vermiculite: "absent", leadPaint: "unknown", combustionAppliances: ["Gas furnace, 78 % AFUE", "Gas water heater"] },
    },
    heating: input.heating,
    leakage: {
      tests: [
        { id: "t-in", phase: "test-in", cfm50: input.blowerDoor.cfm50TestIn, testedAt: TEST_IN_AT, outdoorTempF: 52, windMph: 6, notes: "House as found; basement door open." },
        ...(testOut !== undefined ? [{ id: "t-out", phase: "test-out" as const, cfm50: testOut, testedAt: TEST_OUT_AT, outdoorTempF: 41, windMph: 4, notes: null }] : []),
      ],
      targetCfm50: 2400,
    },
    surfaces: input.surfaces.map((x) => ({ ...x, openings: (("openings" in x ? x.openings : undefined) ?? []).map((o, i) => ({ ...o, id: `${x.id}-o${i + 1}` })) })),
    assemblies: [],
    upgrades: input.upgrades.map((u, i) => ({ ...u, id: `u${i + 1}`, priceBookItemId: null })),
  } as unknown as AssessmentDoc;
}

/** The demo house issued as a savings report, or as a proposal with six priced lines. */
export function demoSnapshot(kind: DocumentKind, opts: DemoOptions = {}): ReportSnapshot {
  const testOut = opts.measured ? (opts.testOutCfm50 ?? 2250) : undefined;
  const input = { ...demoHouseInput, blowerDoor: { ...demoHouseInput.blowerDoor, ...(testOut !== undefined ? { cfm50TestOut: testOut } : {}) } };
  const analysis = analyzeHouse(input);

  let proposal: ProposalTerms | undefined;
  if (kind === "proposal") {
    const bags = analysis.densePack.reduce((a, d) => a + d.bagsRoundedUp, 0);
    const holes = analysis.densePack.reduce((a, d) => a + d.holes, 0);
    const dp = analysis.upgrades.findIndex((u) => u.type === "dense-pack-walls");
    const seal = analysis.upgrades.findIndex((u) => u.type === "air-sealing");
    const attic = analysis.upgrades.findIndex((u) => u.type === "attic-insulation");
    const lines = [
      line("Dense-pack cellulose for all exterior walls, 3.5 lb/ft³ (25 lb bags, from the estimate)", bags, "bag", 1650, dp),
      line("Dense-pack installation labour, crew of two", 40, "hour", 6500, dp),
      line("Drill, plug and patch access holes through siding (lead-safe practices)", holes, "hole", 850, dp),
      line("Air-seal the attic floor: top plates, chases, flue and plumbing bypasses", 1, "job", 180_000, seal),
      line("Attic insulation, loose-fill cellulose to R-49 over 825 ft²", 825, "ft²", 315, attic),
      line("Building permit, and blower-door and combustion-safety test-out", 1, "each", 35_000),
    ];
    const subtotalCents = lines.reduce((a, l) => a + l.totalCents, 0);
    const taxRatePpm = 66_250;
    const taxCents = Math.round((subtotalCents * taxRatePpm) / 1_000_000);
    const totalCents = subtotalCents + taxCents;
    proposal = {
      lines, subtotalCents, upgradesCents: lines.filter((l) => l.upgradeIndex !== undefined).reduce((a, l) => a + l.totalCents, 0), taxRatePpm, taxCents, totalCents,
      depositCents: Math.round((totalCents * 0.25) / 100) * 100,
      validUntil: ISSUED_AT + 30 * DAY,
      terms: [
        "Work is scheduled within four weeks of acceptance and the deposit. The crew works wall by wall and logs the bags blown into each wall against this estimate.",
        "Quantities of dense-pack material are estimates; if a wall takes much more or less than expected, we stop, look for the reason and talk to you before going on. Extra material beyond 10 % of the estimate is billed at the unit price above only with your written agreement.",
        "Hidden conditions found during the work (live knob-and-tube wiring, rot, pests) are reported to you before any extra work is done.",
        "Payment: deposit on acceptance, balance on completion and test-out. Our workmanship is warranted for two years from completion.",
      ].join("\n"),
    };
  }

  return {
    kind,
    version: opts.version ?? 1,
    issuedAt: ISSUED_AT,
    issuedByName: "Maren Oduya",
    company: {
      name: "Kestrel Bay Home Performance",
      phone: "(201) 555-0142",
      email: "office@kestrelbay.example",
      address: "41 Tannery Row, Millbrook Falls, NJ 07990",
      licenseLine: "Home improvement contractor registration KB-DEMO-0042 (demo data)",
      insuranceLine: "General liability insurance $1,000,000 per occurrence; workers' compensation in force",
    },
    job: { id: "job-demo-1928", number: 1042, title: "1928 two-storey: dense-pack walls, air-seal and insulate the attic" },
    house: { street: "17 Alder Crescent", city: "Millbrook Falls", state: "NJ", postalCode: "07990", yearBuilt: demoHouseInput.yearBuilt },
    client: { name: "Priya and Tomas Lindqvist-Hale" },
    leakageBasis: testOut !== undefined ? "measured" : "predicted",
    assessment: assessmentOf(input, testOut),
    analysis,
    ...(proposal ? { proposal } : {}),
    photoIds: [],
  };
}
