// Warmstead's whole data model. Later features add screens, not tables.
//
// Conventions: camelCase keys over snake_case columns; text UUID ids; timestamps
// as integer milliseconds; money in integer cents; JSON in text columns.
// Enums are checked by TypeScript and zod, not by SQL CHECKs: changing a CHECK
// in SQLite means rebuilding the table (see STACK.md pitfall 3).
//
// Deleting a company removes everything it owns. Inside a company, rows that
// would take issued documents or history with them use NO ACTION, not
// RESTRICT: both refuse a direct delete, but NO ACTION is checked at the end of
// the statement, so the company-wide cascade (which removes both sides) passes,
// while RESTRICT would fail or not depending on the order SQLite visits tables.
import { relations, sql } from "drizzle-orm";
import {
  type AnySQLiteColumn,
  check,
  index,
  integer,
  primaryKey,
  real,
  sqliteTable,
  text,
  uniqueIndex,
} from "drizzle-orm/sqlite-core";

// ---------------------------------------------------------------- enums

export const roles = ["owner", "auditor", "installer", "homeowner"] as const;
export type Role = (typeof roles)[number];

export const unitSystems = ["ip", "si"] as const;
export type UnitSystem = (typeof unitSystems)[number];

// One list of stages for the database, the API and the screens.
export { jobStageLabels, jobStages, type JobStage } from "../lib/stages";
import { jobStages } from "../lib/stages";

export const foundations = ["basement", "crawlspace", "slab", "other"] as const;
export type Foundation = (typeof foundations)[number];

export const shieldingClasses = ["well-shielded", "normal", "exposed"] as const;
export type Shielding = (typeof shieldingClasses)[number];

export const fuels = ["gas", "oil", "propane", "electric", "heat-pump"] as const;
export type Fuel = (typeof fuels)[number];

export const assemblyKinds = ["wall", "ceiling", "floor", "window", "door"] as const;
export type AssemblyKind = (typeof assemblyKinds)[number];
export const surfaceKinds = assemblyKinds;
export type SurfaceKind = AssemblyKind;

export const framingMaterials = ["wood", "steel", "masonry", "none"] as const;
export type FramingMaterial = (typeof framingMaterials)[number];

export const assemblyMethods = ["parallel-path", "isothermal-planes"] as const;
export type AssemblyMethod = (typeof assemblyMethods)[number];

export const layerPaths = ["continuous", "cavity", "framing"] as const;
export type LayerPath = (typeof layerPaths)[number];

export const orientations = ["N", "NE", "E", "SE", "S", "SW", "W", "NW", "horizontal"] as const;
export type Orientation = (typeof orientations)[number];

export const leakagePhases = ["test-in", "test-out"] as const;
export type LeakagePhase = (typeof leakagePhases)[number];

export const priceBookKinds = ["material", "labour", "other"] as const;
export type PriceBookKind = (typeof priceBookKinds)[number];

export const priceBookUnits = ["bag", "hour", "hole", "ft2", "ft", "each", "permit"] as const;
export type PriceBookUnit = (typeof priceBookUnits)[number];

export const upgradeTypes = ["dense-pack-walls", "attic-insulation", "air-sealing", "windows"] as const;
export type UpgradeType = (typeof upgradeTypes)[number];

export const proposalStatuses = ["draft", "issued", "accepted", "superseded", "declined"] as const;
export type ProposalStatus = (typeof proposalStatuses)[number];

export const photoTags = ["before", "during", "after", "thermal"] as const;
export type PhotoTag = (typeof photoTags)[number];

export const issuedDocumentKinds = ["savings-report", "proposal"] as const;
export type IssuedDocumentKind = (typeof issuedDocumentKinds)[number];

export const mailStatuses = ["queued", "sent", "failed"] as const;
export type MailStatus = (typeof mailStatuses)[number];

export const authTokenPurposes = ["invite", "sign-in", "reset"] as const;
export type AuthTokenPurpose = (typeof authTokenPurposes)[number];

// ---------------------------------------------------------------- JSON shapes

export type TriState = "present" | "absent" | "unknown";

export type Hazards = {
  knobAndTube: TriState;
  /** Older rows hold a boolean; the assessment writes present / absent / unknown. */
  vermiculite: boolean | TriState;
  /** Free text per appliance, e.g. "gas furnace (atmospheric)". */
  combustionAppliances: string[];
  leadPaint?: TriState;
  balloonFraming?: TriState;
  notes?: string;
};

export type CustomClimate = { hdd65: number; designTempF: number; source: string };

/** Climate derived from an uploaded EPW file; the calc work fills the shape. */
export type EpwClimate = {
  source: string;
  stationName?: string;
  wmo?: string;
  latitude?: number;
  longitude?: number;
  hdd65: number;
  designTempF: number;
  [extra: string]: unknown;
};

export type UpgradeParams = {
  surfaceIds?: string[];
  targetR?: number;
  targetCfm50?: number;
  windowU?: number;
  [extra: string]: unknown;
};

/** An assembly's layer stack in the calc engine's shape (see calc/assemblies.ts AssemblyDef). */
export type AssemblyDefinition = {
  construction: "wood-frame" | "steel-frame" | "masonry";
  method?: "parallel-path" | "isothermal-planes";
  layers: Record<string, unknown>[];
};

export type FuelPrices = Partial<Record<Fuel, number>>;

/** One priced line changed for one job: a quantity, a unit price in cents, or both. */
export type LineOverride = { quantity?: number; unitPriceCents?: number };
/**
 * An upgrade's per-job pricing (lib/documents/proposal-lines.ts prices it): line overrides keyed by
 * the line's key ("bags", "holes", "labour", "area", "hours", "item"), and an optional override of
 * the upgrade's whole installed cost with the reason for it.
 */
export type UpgradePricing = {
  lines?: Record<string, LineOverride>;
  totalOverride?: { cents: number; reason: string } | null;
};

// ---------------------------------------------------------------- column helpers

const id = () =>
  text("id")
    .primaryKey()
    .$defaultFn(() => crypto.randomUUID());
const createdAt = () =>
  integer("created_at", { mode: "timestamp_ms" })
    .notNull()
    .$defaultFn(() => new Date());
const updatedAt = () =>
  integer("updated_at", { mode: "timestamp_ms" })
    .notNull()
    .$defaultFn(() => new Date())
    .$onUpdateFn(() => new Date());
const companyRef = () =>
  text("company_id")
    .notNull()
    .references(() => companies.id, { onDelete: "cascade" });
const jobRef = () =>
  text("job_id")
    .notNull()
    .references(() => jobs.id, { onDelete: "cascade" });

// ---------------------------------------------------------------- tenancy and people

export const companies = sqliteTable("companies", {
  id: id(),
  name: text("name").notNull(),
  slug: text("slug").notNull().unique(),
  phone: text("phone"),
  email: text("email"),
  address: text("address"),
  licenseLine: text("license_line"),
  insuranceLine: text("insurance_line"),
  /** Sales tax in parts per million of the taxable subtotal: 6.625 % is 66 250. */
  taxRatePpm: integer("tax_rate_ppm").notNull().default(0),
  gridCo2LbPerKwh: real("grid_co2_lb_per_kwh"),
  /** Default price per fuel unit (therm, gallon, kWh) in cents, offered on new jobs. */
  fuelPricesCentsPerUnit: text("fuel_prices_cents_per_unit", { mode: "json" }).$type<FuelPrices>(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const users = sqliteTable(
  "users",
  {
    id: id(),
    companyId: companyRef(),
    /** Always lower-case (a CHECK enforces it); unique across all companies. */
    email: text("email").notNull(),
    name: text("name").notNull(),
    passwordHash: text("password_hash"),
    role: text("role", { enum: roles }).notNull(),
    disabled: integer("disabled", { mode: "boolean" }).notNull().default(false),
    unitSystem: text("unit_system", { enum: unitSystems }).notNull().default("ip"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    lastSignInAt: integer("last_sign_in_at", { mode: "timestamp_ms" }),
  },
  (t) => [
    uniqueIndex("users_email_unique").on(t.email),
    index("users_company_role_idx").on(t.companyId, t.role),
    check("users_email_lower_case", sql`${t.email} = lower(${t.email})`),
  ],
);

export const clients = sqliteTable(
  "clients",
  {
    id: id(),
    companyId: companyRef(),
    /** The homeowner's sign-in account, once invited. */
    userId: text("user_id").references(() => users.id, { onDelete: "set null" }),
    name: text("name").notNull(),
    email: text("email"),
    phone: text("phone"),
    mailingAddress: text("mailing_address"),
    notes: text("notes"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("clients_company_name_idx").on(t.companyId, t.name), index("clients_user_idx").on(t.userId)],
);

// ---------------------------------------------------------------- houses and jobs

export const houses = sqliteTable(
  "houses",
  {
    id: id(),
    companyId: companyRef(),
    clientId: text("client_id")
      .notNull()
      .references(() => clients.id, { onDelete: "no action" }),
    street: text("street").notNull(),
    city: text("city").notNull(),
    state: text("state").notNull(),
    postalCode: text("postal_code").notNull(),
    yearBuilt: integer("year_built").notNull(),
    stories: real("stories").notNull(),
    conditionedAreaFt2: real("conditioned_area_ft2").notNull(),
    volumeFt3: real("volume_ft3").notNull(),
    ceilingHeightFt: real("ceiling_height_ft"),
    bedrooms: integer("bedrooms").notNull(),
    foundation: text("foundation", { enum: foundations }).notNull(),
    shielding: text("shielding", { enum: shieldingClasses }).notNull().default("normal"),
    climateStationWmo: text("climate_station_wmo"),
    customClimate: text("custom_climate", { mode: "json" }).$type<CustomClimate>(),
    epwClimate: text("epw_climate", { mode: "json" }).$type<EpwClimate>(),
    indoorDesignTempF: real("indoor_design_temp_f").notNull().default(70),
    indoorRhPct: real("indoor_rh_pct").notNull().default(40),
    hazards: text("hazards", { mode: "json" })
      .$type<Hazards>()
      .notNull()
      .$defaultFn(() => ({ knobAndTube: "unknown", vermiculite: false, combustionAppliances: [] })),
    notes: text("notes"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("houses_company_idx").on(t.companyId), index("houses_client_idx").on(t.clientId)],
);

export const jobs = sqliteTable(
  "jobs",
  {
    id: id(),
    companyId: companyRef(),
    /** Per-company sequential number shown to people ("Job 1004"). */
    number: integer("number").notNull(),
    houseId: text("house_id")
      .notNull()
      .references(() => houses.id, { onDelete: "no action" }),
    clientId: text("client_id")
      .notNull()
      .references(() => clients.id, { onDelete: "no action" }),
    title: text("title").notNull(),
    stage: text("stage", { enum: jobStages }).notNull().default("intake"),
    auditorId: text("auditor_id").references(() => users.id, { onDelete: "set null" }),
    /** What the homeowner called about (cold rooms, drafts, bills, mould). */
    intakeNotes: text("intake_notes"),
    targetCfm50: real("target_cfm50"),
    /** Optimistic concurrency: every update sets version = version + 1 where version = the one edited. */
    version: integer("version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    createdById: text("created_by_id")
      .notNull()
      .references(() => users.id, { onDelete: "no action" }),
  },
  (t) => [
    uniqueIndex("jobs_company_number_unique").on(t.companyId, t.number),
    // The jobs list's orders (newest change first, number as the tie-break), whole and by stage:
    // a page is read straight off the index, with no sort step.
    index("jobs_company_stage_idx").on(t.companyId, t.stage, t.updatedAt, t.number),
    index("jobs_company_updated_idx").on(t.companyId, t.updatedAt, t.number),
    index("jobs_house_idx").on(t.houseId),
    index("jobs_client_idx").on(t.clientId),
    index("jobs_auditor_idx").on(t.auditorId),
  ],
);

/** Installers assigned to a job. */
export const jobCrew = sqliteTable(
  "job_crew",
  {
    jobId: jobRef(),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    assignedAt: integer("assigned_at", { mode: "timestamp_ms" })
      .notNull()
      .$defaultFn(() => new Date()),
  },
  (t) => [primaryKey({ columns: [t.jobId, t.userId] }), index("job_crew_user_idx").on(t.userId)],
);

export const jobStageEvents = sqliteTable(
  "job_stage_events",
  {
    id: id(),
    jobId: jobRef(),
    fromStage: text("from_stage", { enum: jobStages }),
    toStage: text("to_stage", { enum: jobStages }).notNull(),
    byUserId: text("by_user_id")
      .notNull()
      .references(() => users.id, { onDelete: "no action" }),
    at: integer("at", { mode: "timestamp_ms" })
      .notNull()
      .$defaultFn(() => new Date()),
    note: text("note"),
  },
  (t) => [index("job_stage_events_job_at_idx").on(t.jobId, t.at)],
);

export const heatingSystems = sqliteTable(
  "heating_systems",
  {
    id: id(),
    jobId: jobRef(),
    fuel: text("fuel", { enum: fuels }).notNull(),
    /** AFUE as a fraction (0.78) for combustion; COP for electric resistance and heat pumps. */
    efficiency: real("efficiency").notNull(),
    hspf: real("hspf"),
    /** Cents per therm (gas), gallon (oil, propane) or kWh (electric, heat pump). */
    fuelPriceCentsPerUnit: integer("fuel_price_cents_per_unit").notNull(),
    outputBtuh: real("output_btuh"),
    label: text("label").notNull(),
    isPrimary: integer("is_primary", { mode: "boolean" }).notNull().default(true),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("heating_systems_job_idx").on(t.jobId)],
);

// ---------------------------------------------------------------- envelope

/** Company-defined materials beyond the built-in calc library. */
export const materials = sqliteTable(
  "materials",
  {
    id: id(),
    companyId: companyRef(),
    key: text("key").notNull(),
    name: text("name").notNull(),
    category: text("category").notNull(),
    rPerInchIp: real("r_per_inch_ip"),
    rValueIp: real("r_value_ip"),
    densityLbPerFt3: real("density_lb_per_ft3"),
    source: text("source"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("materials_company_key_unique").on(t.companyId, t.key)],
);

export const assemblies = sqliteTable(
  "assemblies",
  {
    id: id(),
    /** Null for a built-in assembly shared by every company. */
    companyId: text("company_id").references(() => companies.id, { onDelete: "cascade" }),
    /** Set for a one-off assembly of one house (kept out of the company library). */
    jobId: text("job_id").references(() => jobs.id, { onDelete: "cascade" }),
    builtInKey: text("built_in_key"),
    /** The calc engine's key for this layer stack (surfaces refer to it); unique within its company or job. */
    key: text("key"),
    /** The layer stack as the calc engine reads it (construction, method, layers outside → inside). */
    definition: text("definition", { mode: "json" }).$type<AssemblyDefinition>(),
    name: text("name").notNull(),
    kind: text("kind", { enum: assemblyKinds }).notNull(),
    framingMaterial: text("framing_material", { enum: framingMaterials }).notNull().default("none"),
    framingMember: text("framing_member"),
    cavityDepthIn: real("cavity_depth_in"),
    spacingIn: real("spacing_in"),
    framingFraction: real("framing_fraction"),
    method: text("method", { enum: assemblyMethods }),
    uFactorOverride: real("u_factor_override"),
    notes: text("notes"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("assemblies_company_kind_idx").on(t.companyId, t.kind),
    index("assemblies_job_idx").on(t.jobId),
    uniqueIndex("assemblies_built_in_key_unique")
      .on(t.builtInKey)
      .where(sql`${t.companyId} is null`),
  ],
);

export const assemblyLayers = sqliteTable(
  "assembly_layers",
  {
    id: id(),
    assemblyId: text("assembly_id")
      .notNull()
      .references(() => assemblies.id, { onDelete: "cascade" }),
    /** Outside to inside, from 0. Not unique, so layers can be reordered one row at a time. */
    position: integer("position").notNull(),
    materialKey: text("material_key").notNull(),
    thicknessIn: real("thickness_in"),
    path: text("path", { enum: layerPaths }).notNull().default("continuous"),
    label: text("label"),
  },
  (t) => [index("assembly_layers_assembly_position_idx").on(t.assemblyId, t.position)],
);

export const surfaces = sqliteTable(
  "surfaces",
  {
    id: id(),
    jobId: jobRef(),
    label: text("label").notNull(),
    kind: text("kind", { enum: surfaceKinds }).notNull(),
    orientation: text("orientation", { enum: orientations }).notNull(),
    grossAreaFt2: real("gross_area_ft2").notNull(),
    existingAssemblyId: text("existing_assembly_id").references(() => assemblies.id, { onDelete: "set null" }),
    proposedAssemblyId: text("proposed_assembly_id").references(() => assemblies.id, { onDelete: "set null" }),
    /** A window or door sits in a wall; it goes when the wall goes. */
    parentSurfaceId: text("parent_surface_id").references((): AnySQLiteColumn => surfaces.id, {
      onDelete: "cascade",
    }),
    position: integer("position").notNull().default(0),
    cavityDepthIn: real("cavity_depth_in"),
    blockedBays: integer("blocked_bays").notNull().default(0),
    /** Key of the existing layer stack: a calc built-in or an assembly of this company or job. */
    assemblyKey: text("assembly_key"),
    heightFt: real("height_ft"),
    /** Fraction of ΔT across a floor or wall to an unheated buffer space (0–1). */
    bufferFactor: real("buffer_factor"),
    blockedBayFraction: real("blocked_bay_fraction"),
    /** Windows and doors: how many of this size, and their product key or whole-unit U-factor. */
    openingCount: integer("opening_count"),
    productKey: text("product_key"),
    uFactorIp: real("u_factor_ip"),
    notes: text("notes"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("surfaces_job_position_idx").on(t.jobId, t.position),
    index("surfaces_parent_idx").on(t.parentSurfaceId),
    index("surfaces_existing_assembly_idx").on(t.existingAssemblyId),
    index("surfaces_proposed_assembly_idx").on(t.proposedAssemblyId),
  ],
);

export const leakageTests = sqliteTable(
  "leakage_tests",
  {
    id: id(),
    jobId: jobRef(),
    phase: text("phase", { enum: leakagePhases }).notNull(),
    cfm50: real("cfm50").notNull(),
    testedAt: integer("tested_at", { mode: "timestamp_ms" }).notNull(),
    outdoorTempF: real("outdoor_temp_f"),
    indoorTempF: real("indoor_temp_f"),
    windMph: real("wind_mph"),
    notes: text("notes"),
    recordedById: text("recorded_by_id")
      .notNull()
      .references(() => users.id, { onDelete: "no action" }),
    createdAt: createdAt(),
  },
  (t) => [index("leakage_tests_job_tested_idx").on(t.jobId, t.testedAt)],
);

// ---------------------------------------------------------------- selling

export const priceBookItems = sqliteTable(
  "price_book_items",
  {
    id: id(),
    companyId: companyRef(),
    code: text("code").notNull(),
    name: text("name").notNull(),
    description: text("description"),
    kind: text("kind", { enum: priceBookKinds }).notNull(),
    unit: text("unit", { enum: priceBookUnits }).notNull(),
    unitPriceCents: integer("unit_price_cents").notNull(),
    taxable: integer("taxable", { mode: "boolean" }).notNull().default(true),
    active: integer("active", { mode: "boolean" }).notNull().default(true),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("price_book_items_company_code_unique").on(t.companyId, t.code),
    index("price_book_items_company_active_idx").on(t.companyId, t.active, t.name),
  ],
);

export const upgrades = sqliteTable(
  "upgrades",
  {
    id: id(),
    jobId: jobRef(),
    type: text("type", { enum: upgradeTypes }).notNull(),
    name: text("name"),
    position: integer("position").notNull().default(0),
    params: text("params", { mode: "json" })
      .$type<UpgradeParams>()
      .notNull()
      .$defaultFn(() => ({})),
    /** Whether the homeowner's proposal includes it. */
    selected: integer("selected", { mode: "boolean" }).notNull().default(true),
    costCents: integer("cost_cents").notNull().default(0),
    lifeYears: integer("life_years").notNull(),
    priceBookItemId: text("price_book_item_id").references(() => priceBookItems.id, { onDelete: "set null" }),
    /** Per-job changes to the lines priced from the price book; `cost_cents` is the priced result. */
    pricing: text("pricing", { mode: "json" }).$type<UpgradePricing>(),
    notes: text("notes"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("upgrades_job_position_idx").on(t.jobId, t.position)],
);

export const proposals = sqliteTable(
  "proposals",
  {
    id: id(),
    jobId: jobRef(),
    status: text("status", { enum: proposalStatuses }).notNull().default("draft"),
    /** The company's rate when the proposal was last priced, in parts per million (6.625 % is 66 250). */
    taxRatePpm: integer("tax_rate_ppm").notNull().default(0),
    depositCents: integer("deposit_cents").notNull().default(0),
    validUntil: integer("valid_until", { mode: "timestamp_ms" }),
    terms: text("terms"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("proposals_job_idx").on(t.jobId)],
);

export const proposalLineItems = sqliteTable(
  "proposal_line_items",
  {
    id: id(),
    proposalId: text("proposal_id")
      .notNull()
      .references(() => proposals.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    priceBookItemId: text("price_book_item_id").references(() => priceBookItems.id, { onDelete: "set null" }),
    upgradeId: text("upgrade_id").references(() => upgrades.id, { onDelete: "set null" }),
    description: text("description").notNull(),
    quantity: real("quantity").notNull(),
    unit: text("unit").notNull(),
    unitPriceCents: integer("unit_price_cents").notNull(),
    totalCents: integer("total_cents").notNull(),
    taxable: integer("taxable", { mode: "boolean" }).notNull().default(true),
  },
  (t) => [index("proposal_line_items_proposal_position_idx").on(t.proposalId, t.position)],
);

// ---------------------------------------------------------------- field work

export const crewLogEntries = sqliteTable(
  "crew_log_entries",
  {
    id: id(),
    jobId: jobRef(),
    surfaceId: text("surface_id").references(() => surfaces.id, { onDelete: "set null" }),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "no action" }),
    /** Made on the phone before sending; a replayed offline submit hits the unique index. */
    clientRequestId: text("client_request_id").notNull().unique(),
    holesDrilled: integer("holes_drilled").notNull().default(0),
    bagsBlown: real("bags_blown").notNull().default(0),
    blockedBays: integer("blocked_bays").notNull().default(0),
    prefilledBays: integer("prefilled_bays").notNull().default(0),
    note: text("note"),
    /** The wall's state after this entry: true marks it done (the underfill check applies), false reopens it. */
    finished: integer("finished", { mode: "boolean" }).notNull().default(false),
    /** How a warning on this wall was dealt with ("found an open chase, sealed and re-blew"). */
    resolution: text("resolution"),
    loggedAt: integer("logged_at", { mode: "timestamp_ms" }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    index("crew_log_entries_job_logged_idx").on(t.jobId, t.loggedAt),
    index("crew_log_entries_surface_idx").on(t.surfaceId),
  ],
);

export const safetyAcknowledgements = sqliteTable(
  "safety_acknowledgements",
  {
    id: id(),
    jobId: jobRef(),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "no action" }),
    cautionKeys: text("caution_keys", { mode: "json" }).$type<string[]>().notNull(),
    acknowledgedAt: integer("acknowledged_at", { mode: "timestamp_ms" })
      .notNull()
      .$defaultFn(() => new Date()),
  },
  (t) => [index("safety_acknowledgements_job_user_idx").on(t.jobId, t.userId)],
);

export const photos = sqliteTable(
  "photos",
  {
    id: id(),
    companyId: companyRef(),
    jobId: jobRef(),
    surfaceId: text("surface_id").references(() => surfaces.id, { onDelete: "set null" }),
    crewLogEntryId: text("crew_log_entry_id").references(() => crewLogEntries.id, { onDelete: "set null" }),
    tag: text("tag", { enum: photoTags }).notNull(),
    caption: text("caption"),
    storageKey: text("storage_key").notNull().unique(),
    thumbnailKey: text("thumbnail_key"),
    contentType: text("content_type").notNull(),
    bytes: integer("bytes").notNull(),
    width: integer("width"),
    height: integer("height"),
    takenAt: integer("taken_at", { mode: "timestamp_ms" }),
    uploadedById: text("uploaded_by_id")
      .notNull()
      .references(() => users.id, { onDelete: "no action" }),
    createdAt: createdAt(),
  },
  (t) => [
    index("photos_job_created_idx").on(t.jobId, t.createdAt),
    index("photos_company_created_idx").on(t.companyId, t.createdAt),
    index("photos_surface_idx").on(t.surfaceId),
    index("photos_crew_log_entry_idx").on(t.crewLogEntryId),
  ],
);

// ---------------------------------------------------------------- documents

/** A frozen snapshot sent to the homeowner. Never edited; a new issue is a new version. */
export const issuedDocuments = sqliteTable(
  "issued_documents",
  {
    id: id(),
    companyId: companyRef(),
    /** NO ACTION: a job that has issued documents cannot be deleted. */
    jobId: text("job_id")
      .notNull()
      .references(() => jobs.id, { onDelete: "no action" }),
    kind: text("kind", { enum: issuedDocumentKinds }).notNull(),
    version: integer("version").notNull(),
    snapshot: text("snapshot", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    /** SHA-256 (hex) of the canonical snapshot JSON. */
    contentHash: text("content_hash").notNull(),
    issuedAt: integer("issued_at", { mode: "timestamp_ms" })
      .notNull()
      .$defaultFn(() => new Date()),
    issuedById: text("issued_by_id")
      .notNull()
      .references(() => users.id, { onDelete: "no action" }),
    supersededAt: integer("superseded_at", { mode: "timestamp_ms" }),
    proposalId: text("proposal_id").references(() => proposals.id, { onDelete: "no action" }),
  },
  (t) => [
    uniqueIndex("issued_documents_job_kind_version_unique").on(t.jobId, t.kind, t.version),
    index("issued_documents_company_issued_idx").on(t.companyId, t.issuedAt),
    index("issued_documents_proposal_idx").on(t.proposalId),
  ],
);

/** A homeowner's signature on an issued proposal. Part of the document: it goes only with it. */
export const acceptances = sqliteTable(
  "acceptances",
  {
    id: id(),
    issuedDocumentId: text("issued_document_id")
      .notNull()
      .unique()
      .references(() => issuedDocuments.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    ip: text("ip"),
    userAgent: text("user_agent"),
    /** The contentHash the homeowner saw when signing. */
    documentHash: text("document_hash").notNull(),
    acceptedAt: integer("accepted_at", { mode: "timestamp_ms" })
      .notNull()
      .$defaultFn(() => new Date()),
    userId: text("user_id").references(() => users.id, { onDelete: "no action" }),
  },
);

// ---------------------------------------------------------------- system

export const mailOutbox = sqliteTable(
  "mail_outbox",
  {
    id: id(),
    companyId: text("company_id").references(() => companies.id, { onDelete: "cascade" }),
    to: text("to").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
    kind: text("kind").notNull(),
    status: text("status", { enum: mailStatuses }).notNull().default("queued"),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    nextAttemptAt: integer("next_attempt_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
    sentAt: integer("sent_at", { mode: "timestamp_ms" }),
    relatedJobId: text("related_job_id").references(() => jobs.id, { onDelete: "set null" }),
  },
  (t) => [
    index("mail_outbox_status_created_idx").on(t.status, t.createdAt),
    index("mail_outbox_company_created_idx").on(t.companyId, t.createdAt),
    index("mail_outbox_related_job_idx").on(t.relatedJobId),
  ],
);

/** Invite / set-password and one-time sign-in links. Only a hash of the token is stored. */
export const authTokens = sqliteTable(
  "auth_tokens",
  {
    id: id(),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    purpose: text("purpose", { enum: authTokenPurposes }).notNull(),
    tokenHash: text("token_hash").notNull().unique(),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    usedAt: integer("used_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [index("auth_tokens_user_idx").on(t.userId)],
);

export const activityLog = sqliteTable(
  "activity_log",
  {
    id: id(),
    companyId: text("company_id").references(() => companies.id, { onDelete: "cascade" }),
    userId: text("user_id").references(() => users.id, { onDelete: "set null" }),
    /** "sign-in", "sign-in-failed", "job.create", "job.update", "job.stage", ... */
    action: text("action").notNull(),
    entityType: text("entity_type"),
    entityId: text("entity_id"),
    detail: text("detail", { mode: "json" }).$type<Record<string, unknown>>(),
    ip: text("ip"),
    at: integer("at", { mode: "timestamp_ms" })
      .notNull()
      .$defaultFn(() => new Date()),
  },
  (t) => [
    index("activity_log_company_at_idx").on(t.companyId, t.at),
    index("activity_log_entity_idx").on(t.entityType, t.entityId),
    index("activity_log_user_idx").on(t.userId),
  ],
);

/** Login limiter state that survives a restart. key: "email:<address>" or "ip:<address>". */
export const signInAttempts = sqliteTable("sign_in_attempts", {
  key: text("key").primaryKey(),
  failures: integer("failures").notNull().default(0),
  firstFailureAt: integer("first_failure_at", { mode: "timestamp_ms" }).notNull(),
  lockedUntil: integer("locked_until", { mode: "timestamp_ms" }),
});

// ---------------------------------------------------------------- relations

export const companiesRelations = relations(companies, ({ many }) => ({
  users: many(users),
  clients: many(clients),
  houses: many(houses),
  jobs: many(jobs),
  materials: many(materials),
  assemblies: many(assemblies),
  priceBookItems: many(priceBookItems),
  photos: many(photos),
  issuedDocuments: many(issuedDocuments),
  mail: many(mailOutbox),
  activity: many(activityLog),
}));

export const usersRelations = relations(users, ({ one, many }) => ({
  company: one(companies, { fields: [users.companyId], references: [companies.id] }),
  clients: many(clients),
  auditedJobs: many(jobs, { relationName: "jobAuditor" }),
  createdJobs: many(jobs, { relationName: "jobCreator" }),
  crewAssignments: many(jobCrew),
  authTokens: many(authTokens),
}));

export const clientsRelations = relations(clients, ({ one, many }) => ({
  company: one(companies, { fields: [clients.companyId], references: [companies.id] }),
  user: one(users, { fields: [clients.userId], references: [users.id] }),
  houses: many(houses),
  jobs: many(jobs),
}));

export const housesRelations = relations(houses, ({ one, many }) => ({
  company: one(companies, { fields: [houses.companyId], references: [companies.id] }),
  client: one(clients, { fields: [houses.clientId], references: [clients.id] }),
  jobs: many(jobs),
}));

export const jobsRelations = relations(jobs, ({ one, many }) => ({
  company: one(companies, { fields: [jobs.companyId], references: [companies.id] }),
  house: one(houses, { fields: [jobs.houseId], references: [houses.id] }),
  client: one(clients, { fields: [jobs.clientId], references: [clients.id] }),
  auditor: one(users, { fields: [jobs.auditorId], references: [users.id], relationName: "jobAuditor" }),
  createdBy: one(users, { fields: [jobs.createdById], references: [users.id], relationName: "jobCreator" }),
  crew: many(jobCrew),
  stageEvents: many(jobStageEvents),
  heatingSystems: many(heatingSystems),
  assemblies: many(assemblies),
  surfaces: many(surfaces),
  leakageTests: many(leakageTests),
  upgrades: many(upgrades),
  proposals: many(proposals),
  crewLog: many(crewLogEntries),
  safetyAcknowledgements: many(safetyAcknowledgements),
  photos: many(photos),
  issuedDocuments: many(issuedDocuments),
}));

export const jobCrewRelations = relations(jobCrew, ({ one }) => ({
  job: one(jobs, { fields: [jobCrew.jobId], references: [jobs.id] }),
  user: one(users, { fields: [jobCrew.userId], references: [users.id] }),
}));

export const jobStageEventsRelations = relations(jobStageEvents, ({ one }) => ({
  job: one(jobs, { fields: [jobStageEvents.jobId], references: [jobs.id] }),
  byUser: one(users, { fields: [jobStageEvents.byUserId], references: [users.id] }),
}));

export const heatingSystemsRelations = relations(heatingSystems, ({ one }) => ({
  job: one(jobs, { fields: [heatingSystems.jobId], references: [jobs.id] }),
}));

export const materialsRelations = relations(materials, ({ one }) => ({
  company: one(companies, { fields: [materials.companyId], references: [companies.id] }),
}));

export const assembliesRelations = relations(assemblies, ({ one, many }) => ({
  company: one(companies, { fields: [assemblies.companyId], references: [companies.id] }),
  job: one(jobs, { fields: [assemblies.jobId], references: [jobs.id] }),
  layers: many(assemblyLayers),
}));

export const assemblyLayersRelations = relations(assemblyLayers, ({ one }) => ({
  assembly: one(assemblies, { fields: [assemblyLayers.assemblyId], references: [assemblies.id] }),
}));

export const surfacesRelations = relations(surfaces, ({ one, many }) => ({
  job: one(jobs, { fields: [surfaces.jobId], references: [jobs.id] }),
  existingAssembly: one(assemblies, {
    fields: [surfaces.existingAssemblyId],
    references: [assemblies.id],
    relationName: "existingAssembly",
  }),
  proposedAssembly: one(assemblies, {
    fields: [surfaces.proposedAssemblyId],
    references: [assemblies.id],
    relationName: "proposedAssembly",
  }),
  parent: one(surfaces, { fields: [surfaces.parentSurfaceId], references: [surfaces.id], relationName: "openings" }),
  openings: many(surfaces, { relationName: "openings" }),
  crewLog: many(crewLogEntries),
  photos: many(photos),
}));

export const leakageTestsRelations = relations(leakageTests, ({ one }) => ({
  job: one(jobs, { fields: [leakageTests.jobId], references: [jobs.id] }),
  recordedBy: one(users, { fields: [leakageTests.recordedById], references: [users.id] }),
}));

export const priceBookItemsRelations = relations(priceBookItems, ({ one }) => ({
  company: one(companies, { fields: [priceBookItems.companyId], references: [companies.id] }),
}));

export const upgradesRelations = relations(upgrades, ({ one }) => ({
  job: one(jobs, { fields: [upgrades.jobId], references: [jobs.id] }),
  priceBookItem: one(priceBookItems, { fields: [upgrades.priceBookItemId], references: [priceBookItems.id] }),
}));

export const proposalsRelations = relations(proposals, ({ one, many }) => ({
  job: one(jobs, { fields: [proposals.jobId], references: [jobs.id] }),
  lineItems: many(proposalLineItems),
  issuedDocuments: many(issuedDocuments),
}));

export const proposalLineItemsRelations = relations(proposalLineItems, ({ one }) => ({
  proposal: one(proposals, { fields: [proposalLineItems.proposalId], references: [proposals.id] }),
  priceBookItem: one(priceBookItems, { fields: [proposalLineItems.priceBookItemId], references: [priceBookItems.id] }),
  upgrade: one(upgrades, { fields: [proposalLineItems.upgradeId], references: [upgrades.id] }),
}));

export const crewLogEntriesRelations = relations(crewLogEntries, ({ one, many }) => ({
  job: one(jobs, { fields: [crewLogEntries.jobId], references: [jobs.id] }),
  surface: one(surfaces, { fields: [crewLogEntries.surfaceId], references: [surfaces.id] }),
  user: one(users, { fields: [crewLogEntries.userId], references: [users.id] }),
  photos: many(photos),
}));

export const safetyAcknowledgementsRelations = relations(safetyAcknowledgements, ({ one }) => ({
  job: one(jobs, { fields: [safetyAcknowledgements.jobId], references: [jobs.id] }),
  user: one(users, { fields: [safetyAcknowledgements.userId], references: [users.id] }),
}));

export const photosRelations = relations(photos, ({ one }) => ({
  company: one(companies, { fields: [photos.companyId], references: [companies.id] }),
  job: one(jobs, { fields: [photos.jobId], references: [jobs.id] }),
  surface: one(surfaces, { fields: [photos.surfaceId], references: [surfaces.id] }),
  crewLogEntry: one(crewLogEntries, { fields: [photos.crewLogEntryId], references: [crewLogEntries.id] }),
  uploadedBy: one(users, { fields: [photos.uploadedById], references: [users.id] }),
}));

export const issuedDocumentsRelations = relations(issuedDocuments, ({ one }) => ({
  company: one(companies, { fields: [issuedDocuments.companyId], references: [companies.id] }),
  job: one(jobs, { fields: [issuedDocuments.jobId], references: [jobs.id] }),
  issuedBy: one(users, { fields: [issuedDocuments.issuedById], references: [users.id] }),
  proposal: one(proposals, { fields: [issuedDocuments.proposalId], references: [proposals.id] }),
  acceptance: one(acceptances),
}));

export const acceptancesRelations = relations(acceptances, ({ one }) => ({
  issuedDocument: one(issuedDocuments, {
    fields: [acceptances.issuedDocumentId],
    references: [issuedDocuments.id],
  }),
  user: one(users, { fields: [acceptances.userId], references: [users.id] }),
}));

export const mailOutboxRelations = relations(mailOutbox, ({ one }) => ({
  company: one(companies, { fields: [mailOutbox.companyId], references: [companies.id] }),
  relatedJob: one(jobs, { fields: [mailOutbox.relatedJobId], references: [jobs.id] }),
}));

export const authTokensRelations = relations(authTokens, ({ one }) => ({
  user: one(users, { fields: [authTokens.userId], references: [users.id] }),
}));

export const activityLogRelations = relations(activityLog, ({ one }) => ({
  company: one(companies, { fields: [activityLog.companyId], references: [companies.id] }),
  user: one(users, { fields: [activityLog.userId], references: [users.id] }),
}));

// ---------------------------------------------------------------- row types

export type Company = typeof companies.$inferSelect;
export type NewCompany = typeof companies.$inferInsert;
export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;
export type Client = typeof clients.$inferSelect;
export type NewClient = typeof clients.$inferInsert;
export type House = typeof houses.$inferSelect;
export type NewHouse = typeof houses.$inferInsert;
export type Job = typeof jobs.$inferSelect;
export type NewJob = typeof jobs.$inferInsert;
export type JobCrew = typeof jobCrew.$inferSelect;
export type NewJobCrew = typeof jobCrew.$inferInsert;
export type JobStageEvent = typeof jobStageEvents.$inferSelect;
export type NewJobStageEvent = typeof jobStageEvents.$inferInsert;
export type HeatingSystem = typeof heatingSystems.$inferSelect;
export type NewHeatingSystem = typeof heatingSystems.$inferInsert;
export type Material = typeof materials.$inferSelect;
export type NewMaterial = typeof materials.$inferInsert;
export type Assembly = typeof assemblies.$inferSelect;
export type NewAssembly = typeof assemblies.$inferInsert;
export type AssemblyLayer = typeof assemblyLayers.$inferSelect;
export type NewAssemblyLayer = typeof assemblyLayers.$inferInsert;
export type Surface = typeof surfaces.$inferSelect;
export type NewSurface = typeof surfaces.$inferInsert;
export type LeakageTest = typeof leakageTests.$inferSelect;
export type NewLeakageTest = typeof leakageTests.$inferInsert;
export type PriceBookItem = typeof priceBookItems.$inferSelect;
export type NewPriceBookItem = typeof priceBookItems.$inferInsert;
export type Upgrade = typeof upgrades.$inferSelect;
export type NewUpgrade = typeof upgrades.$inferInsert;
export type Proposal = typeof proposals.$inferSelect;
export type NewProposal = typeof proposals.$inferInsert;
export type ProposalLineItem = typeof proposalLineItems.$inferSelect;
export type NewProposalLineItem = typeof proposalLineItems.$inferInsert;
export type CrewLogEntry = typeof crewLogEntries.$inferSelect;
export type NewCrewLogEntry = typeof crewLogEntries.$inferInsert;
export type SafetyAcknowledgement = typeof safetyAcknowledgements.$inferSelect;
export type NewSafetyAcknowledgement = typeof safetyAcknowledgements.$inferInsert;
export type Photo = typeof photos.$inferSelect;
export type NewPhoto = typeof photos.$inferInsert;
export type IssuedDocument = typeof issuedDocuments.$inferSelect;
export type NewIssuedDocument = typeof issuedDocuments.$inferInsert;
export type Acceptance = typeof acceptances.$inferSelect;
export type NewAcceptance = typeof acceptances.$inferInsert;
export type MailOutboxMessage = typeof mailOutbox.$inferSelect;
export type NewMailOutboxMessage = typeof mailOutbox.$inferInsert;
export type AuthToken = typeof authTokens.$inferSelect;
export type NewAuthToken = typeof authTokens.$inferInsert;
export type ActivityLogEntry = typeof activityLog.$inferSelect;
export type NewActivityLogEntry = typeof activityLog.$inferInsert;
export type SignInAttempt = typeof signInAttempts.$inferSelect;
export type NewSignInAttempt = typeof signInAttempts.$inferInsert;
