// The invented demo company of PRODUCT.md, as rows. Every name, address,
// phone number and licence line here is made up; the town of Harrowmere, NJ
// does not exist, 07000 is not a real ZIP code, 555-01xx numbers are reserved
// for fiction and *.example is a reserved domain.
import { createHash } from "node:crypto";
import type {
  Fuel,
  JobStage,
  NewClient,
  NewCompany,
  NewHeatingSystem,
  NewHouse,
  NewJob,
  NewJobCrew,
  NewJobStageEvent,
  NewLeakageTest,
  NewPriceBookItem,
  NewUser,
  Role,
} from "./schema";
import { jobStages } from "./schema";

/** A stable UUID (version-5 layout) for a seed row, so re-running the seed finds the same rows. */
export function seedId(name: string): string {
  const b = createHash("sha1").update(`warmstead-seed:${name}`).digest().subarray(0, 16);
  b[6] = (b[6] & 0x0f) | 0x50;
  b[8] = (b[8] & 0x3f) | 0x80;
  const h = b.toString("hex");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

export const demoPassword = "warmstead-demo";
export const demoCompanyId = seedId("company:kestrel-bay");
export const demoJobId = seedId("job:1006");
export const demoHouseId = seedId("house:tansyfield");

type Account = { key: string; email: string; role: Role; name: string };

const accounts: Account[] = [
  { key: "owner", email: "owner@kestrelbay.example", role: "owner", name: "Maren Holloway" },
  { key: "auditor", email: "auditor@kestrelbay.example", role: "auditor", name: "Tobias Lindqvist-Ayre" },
  { key: "auditor2", email: "auditor2@kestrelbay.example", role: "auditor", name: "Priya Vantongeren" },
  { key: "installer", email: "installer@kestrelbay.example", role: "installer", name: "Dario Mendel-Quist" },
  { key: "installer2", email: "installer2@kestrelbay.example", role: "installer", name: "Sam Okafor-Reyes" },
  { key: "homeowner", email: "homeowner@kestrelbay.example", role: "homeowner", name: "Eleanor Pashley-Wren" },
  { key: "homeowner2", email: "homeowner2@kestrelbay.example", role: "homeowner", name: "Jun Ostrowe" },
  { key: "homeowner3", email: "homeowner3@kestrelbay.example", role: "homeowner", name: "Beatrix Calloway-Nunes" },
];

/** The sign-ins the demo script prints. All share `demoPassword`. */
export const demoAccounts = accounts.map(({ email, role, name }) => ({ email, role, name }));

const userId = (key: string) => seedId(`user:${key}`);

const fuelPrices: Record<Fuel, number> = { gas: 145, oil: 389, propane: 329, electric: 19, "heat-pump": 19 };

type HouseSpec = {
  key: string;
  client: { name: string; phone: string; email?: string; account?: string };
  street: string;
  yearBuilt: number;
  stories: number;
  areaFt2: number;
  ceilingFt: number;
  bedrooms: number;
  foundation: NewHouse["foundation"];
  heating: { fuel: Fuel; efficiency: number; label: string };
  hazards?: NewHouse["hazards"];
  notes?: string;
};

const houseSpecs: HouseSpec[] = [
  {
    key: "tansyfield",
    client: { name: "Eleanor Pashley-Wren", phone: "(732) 555-0117", account: "homeowner" },
    street: "27 Tansyfield Road",
    yearBuilt: 1928,
    stories: 2,
    areaFt2: 1650,
    ceilingFt: 8.5,
    bedrooms: 3,
    foundation: "basement",
    heating: { fuel: "gas", efficiency: 0.78, label: "Gas furnace, 78 % AFUE" },
    hazards: {
      knobAndTube: "present",
      vermiculite: false,
      combustionAppliances: ["gas furnace (atmospheric draft)", "gas water heater (atmospheric draft)"],
      leadPaint: "unknown",
      balloonFraming: "unknown",
      notes: "Knob-and-tube seen in the attic: confirm it is dead or have an electrician look before insulating over it.",
    },
    notes: "Wood frame, 2x4 at 16 in. o.c., plaster on wood lath, bevel siding over board sheathing.",
  },
  {
    key: "larkmoor",
    client: { name: "Jun Ostrowe", phone: "(732) 555-0123", account: "homeowner2" },
    street: "114 Larkmoor Avenue",
    yearBuilt: 1955,
    stories: 1.5,
    areaFt2: 1280,
    ceilingFt: 7.75,
    bedrooms: 3,
    foundation: "basement",
    heating: { fuel: "gas", efficiency: 0.8, label: "Gas furnace, 80 % AFUE" },
  },
  {
    key: "gorse-hill",
    client: { name: "Beatrix Calloway-Nunes", phone: "(732) 555-0131", account: "homeowner3" },
    street: "302 Gorse Hill Road",
    yearBuilt: 1910,
    stories: 2,
    areaFt2: 2100,
    ceilingFt: 9,
    bedrooms: 4,
    foundation: "basement",
    heating: { fuel: "oil", efficiency: 0.82, label: "Oil boiler, 82 % AFUE" },
  },
  {
    key: "oriel",
    client: { name: "Wendell Marchbank", phone: "(732) 555-0138", email: "wendell.marchbank@mail.example" },
    street: "9 Oriel Crescent",
    yearBuilt: 1962,
    stories: 1,
    areaFt2: 1420,
    ceilingFt: 8,
    bedrooms: 3,
    foundation: "crawlspace",
    heating: { fuel: "oil", efficiency: 0.8, label: "Oil furnace, 80 % AFUE" },
  },
  {
    key: "quillmere",
    client: { name: "Corinne Abernathy-Lusk", phone: "(732) 555-0146", email: "corinne.al@mail.example" },
    street: "75 Quillmere Road",
    yearBuilt: 1924,
    stories: 2,
    areaFt2: 1760,
    ceilingFt: 8.5,
    bedrooms: 3,
    foundation: "basement",
    heating: { fuel: "propane", efficiency: 0.92, label: "Propane furnace, 92 % AFUE" },
  },
  {
    key: "wrenhaven",
    client: { name: "Odile Fenwright", phone: "(732) 555-0152" },
    street: "61 Wrenhaven Court",
    yearBuilt: 1978,
    stories: 2,
    areaFt2: 1900,
    ceilingFt: 8,
    bedrooms: 4,
    foundation: "slab",
    heating: { fuel: "heat-pump", efficiency: 2.6, label: "Air-source heat pump, HSPF 8.2" },
  },
  {
    key: "fennick",
    client: { name: "Harold Tennant-Voss", phone: "(732) 555-0169" },
    street: "18 Fennick Street",
    yearBuilt: 1941,
    stories: 1.5,
    areaFt2: 1150,
    ceilingFt: 7.5,
    bedrooms: 2,
    foundation: "basement",
    heating: { fuel: "gas", efficiency: 0.95, label: "Gas furnace, 95 % AFUE" },
  },
];

type JobSpec = {
  number: number;
  house: string;
  title: string;
  stage: JobStage;
  /** Days ago the job was opened and last moved; the stages between are spread evenly. */
  openedDaysAgo: number;
  lastMovedDaysAgo: number;
  auditor?: string;
  crew?: string[];
  testIn?: number;
  testOut?: number;
  intakeNotes?: string;
};

const jobSpecs: JobSpec[] = [
  { number: 1001, house: "fennick", title: "Attic air sealing and insulation", stage: "closed", openedDaysAgo: 320, lastMovedDaysAgo: 290, auditor: "auditor2", crew: ["installer2"], testIn: 2450, testOut: 1680 },
  { number: 1002, house: "gorse-hill", title: "Dense-pack walls and air sealing", stage: "verified", openedDaysAgo: 75, lastMovedDaysAgo: 9, auditor: "auditor", crew: ["installer"], testIn: 4800, testOut: 3100 },
  { number: 1003, house: "larkmoor", title: "Dense-pack walls, kneewall attic sealing", stage: "installing", openedDaysAgo: 48, lastMovedDaysAgo: 1, auditor: "auditor2", crew: ["installer", "installer2"], testIn: 2900 },
  { number: 1004, house: "quillmere", title: "Walls, attic and rim joists", stage: "approved", openedDaysAgo: 40, lastMovedDaysAgo: 5, auditor: "auditor", crew: ["installer"], testIn: 3300 },
  { number: 1005, house: "oriel", title: "Attic insulation and crawlspace sealing", stage: "proposed", openedDaysAgo: 30, lastMovedDaysAgo: 12, auditor: "auditor2", testIn: 2600 },
  {
    number: 1006,
    house: "tansyfield",
    title: "Cold upstairs and drafts: walls, attic floor, air sealing",
    stage: "assessed",
    openedDaysAgo: 16,
    lastMovedDaysAgo: 3,
    auditor: "auditor",
    crew: ["installer"],
    testIn: 3900,
    intakeNotes: "Upstairs bedrooms cold all winter, drafts at the baseboards, high gas bills.",
  },
  { number: 1007, house: "wrenhaven", title: "High electric bills in winter", stage: "intake", openedDaysAgo: 6, lastMovedDaysAgo: 6, auditor: "auditor2", intakeNotes: "Heat pump runs on strip heat most of January." },
  { number: 1008, house: "fennick", title: "Basement rim joists (follow-up to job 1001)", stage: "intake", openedDaysAgo: 2, lastMovedDaysAgo: 2, intakeNotes: "Cold floor over the basement; asked after last year's attic job." },
];

// Who moves a job into each stage.
const stageActor: Record<JobStage, (job: JobSpec) => string> = {
  intake: () => "owner",
  assessed: (j) => j.auditor ?? "owner",
  proposed: (j) => j.auditor ?? "owner",
  approved: () => "owner",
  installing: (j) => j.crew?.[0] ?? "owner",
  verified: (j) => j.auditor ?? "owner",
  closed: () => "owner",
};

export type SeedRows = {
  company: NewCompany;
  users: NewUser[];
  clients: NewClient[];
  houses: NewHouse[];
  jobs: NewJob[];
  jobCrew: NewJobCrew[];
  jobStageEvents: NewJobStageEvent[];
  heatingSystems: NewHeatingSystem[];
  leakageTests: NewLeakageTest[];
  priceBookItems: NewPriceBookItem[];
};

export function buildScenario(now: Date, passwordHash: string): SeedRows {
  const day = 24 * 60 * 60 * 1000;
  const at = (daysAgo: number) => new Date(now.getTime() - daysAgo * day);
  const companyId = demoCompanyId;

  const users: NewUser[] = accounts.map((a) => ({
    id: userId(a.key),
    companyId,
    email: a.email,
    name: a.name,
    role: a.role,
    passwordHash,
    createdAt: at(400),
    updatedAt: at(400),
  }));

  const clients: NewClient[] = houseSpecs.map((h) => ({
    id: seedId(`client:${h.key}`),
    companyId,
    userId: h.client.account ? userId(h.client.account) : null,
    name: h.client.name,
    email: h.client.account ? accounts.find((a) => a.key === h.client.account)!.email : (h.client.email ?? null),
    phone: h.client.phone,
    mailingAddress: `${h.street}, Harrowmere, NJ 07000`,
  }));

  const houses: NewHouse[] = houseSpecs.map((h) => ({
    id: seedId(`house:${h.key}`),
    companyId,
    clientId: seedId(`client:${h.key}`),
    street: h.street,
    city: "Harrowmere",
    state: "NJ",
    postalCode: "07000",
    yearBuilt: h.yearBuilt,
    stories: h.stories,
    conditionedAreaFt2: h.areaFt2,
    volumeFt3: h.areaFt2 * h.ceilingFt,
    ceilingHeightFt: h.ceilingFt,
    bedrooms: h.bedrooms,
    foundation: h.foundation,
    shielding: "normal",
    // Newark International Airport, NJ: the nearest real station to the invented town.
    climateStationWmo: "725020",
    hazards: h.hazards ?? {
      knobAndTube: h.yearBuilt < 1950 ? "unknown" : "absent",
      vermiculite: false,
      combustionAppliances: h.heating.fuel === "heat-pump" || h.heating.fuel === "electric" ? [] : [h.heating.label],
    },
    notes: h.notes ?? null,
  }));

  const rows: SeedRows = {
    company: {
      id: companyId,
      name: "Kestrel Bay Home Performance",
      slug: "kestrel-bay",
      phone: "(732) 555-0142",
      email: "office@kestrelbay.example",
      address: "48 Ferrowick Lane, Harrowmere, NJ 07000",
      licenseLine: "NJ Home Improvement Contractor Reg. No. 13VH00000000 (demo)",
      insuranceLine: "General liability $1,000,000 per occurrence; certificate on request (demo)",
      // 6.625 % on taxable lines (the permit is not), in parts per million: a demo figure, not tax advice.
      taxRatePpm: 66_250,
      gridCo2LbPerKwh: null,
      fuelPricesCentsPerUnit: fuelPrices,
      createdAt: at(400),
      updatedAt: at(400),
    },
    users,
    clients,
    houses,
    jobs: [],
    jobCrew: [],
    jobStageEvents: [],
    heatingSystems: [],
    leakageTests: [],
    priceBookItems: priceBook(companyId, at(400)),
  };

  for (const spec of jobSpecs) {
    const jobId = seedId(`job:${spec.number}`);
    const house = houseSpecs.find((h) => h.key === spec.house)!;
    const reached = jobStages.slice(0, jobStages.indexOf(spec.stage) + 1);
    const span = spec.openedDaysAgo - spec.lastMovedDaysAgo;
    const step = reached.length > 1 ? span / (reached.length - 1) : 0;
    const stageAt = (i: number) => at(spec.openedDaysAgo - i * step);
    reached.forEach((stage, i) => {
      rows.jobStageEvents.push({
        id: seedId(`stage:${spec.number}:${stage}`),
        jobId,
        fromStage: i === 0 ? null : reached[i - 1],
        toStage: stage,
        byUserId: userId(stageActor[stage](spec)),
        at: stageAt(i),
        note: i === 0 ? "Job opened from a phone call." : null,
      });
    });
    rows.jobs.push({
      id: jobId,
      companyId,
      number: spec.number,
      houseId: seedId(`house:${spec.house}`),
      clientId: seedId(`client:${spec.house}`),
      title: spec.title,
      stage: spec.stage,
      auditorId: spec.auditor ? userId(spec.auditor) : null,
      intakeNotes: spec.intakeNotes ?? null,
      createdAt: stageAt(0),
      updatedAt: stageAt(reached.length - 1),
      createdById: userId("owner"),
    });
    for (const installer of spec.crew ?? []) {
      rows.jobCrew.push({ jobId, userId: userId(installer), assignedAt: stageAt(Math.min(3, reached.length - 1)) });
    }
    rows.heatingSystems.push({
      id: seedId(`heating:${spec.number}`),
      jobId,
      fuel: house.heating.fuel,
      efficiency: house.heating.efficiency,
      hspf: house.heating.fuel === "heat-pump" ? 8.2 : null,
      fuelPriceCentsPerUnit: fuelPrices[house.heating.fuel],
      label: house.heating.label,
      isPrimary: true,
    });
    const tests: [NewLeakageTest["phase"], number | undefined, number][] = [
      ["test-in", spec.testIn, 1],
      ["test-out", spec.testOut, 5],
    ];
    for (const [phase, cfm50, stageIndex] of tests) {
      if (cfm50 === undefined) continue;
      rows.leakageTests.push({
        id: seedId(`leakage:${spec.number}:${phase}`),
        jobId,
        phase,
        cfm50,
        testedAt: stageAt(stageIndex),
        outdoorTempF: phase === "test-in" ? 41 : 48,
        indoorTempF: 68,
        windMph: 6,
        recordedById: userId(spec.auditor ?? "auditor"),
      });
    }
  }
  return rows;
}

function priceBook(companyId: string, createdAt: Date): NewPriceBookItem[] {
  const items: Omit<NewPriceBookItem, "id" | "companyId">[] = [
    { code: "CEL-BAG", name: "Dense-pack cellulose", kind: "material", unit: "bag", unitPriceCents: 1650 },
    { code: "LAB-INS", name: "Insulation labour", kind: "labour", unit: "hour", unitPriceCents: 8500 },
    { code: "DRILL-PLUG", name: "Drill, plug and patch", kind: "labour", unit: "hole", unitPriceCents: 900 },
    { code: "AIR-SEAL", name: "Air sealing labour", kind: "labour", unit: "hour", unitPriceCents: 9500 },
    { code: "ATTIC-BLOWN", name: "Attic insulation, blown loose fill", kind: "material", unit: "ft2", unitPriceCents: 185 },
    { code: "WINDOW", name: "Replacement window, installed", kind: "material", unit: "each", unitPriceCents: 68000 },
    { code: "PERMIT", name: "Building permit and inspection", kind: "other", unit: "permit", unitPriceCents: 25000, taxable: false },
  ];
  return items.map((item) => ({ ...item, id: seedId(`price:${item.code}`), companyId, createdAt, updatedAt: createdAt }));
}
