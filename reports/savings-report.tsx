// The savings report as a PDF: a first page in plain words with the figures a homeowner asks
// about, then the charts, the upgrades, the moisture and ventilation findings, the cautions and
// "how we calculated this". Drawn only from the issued snapshot (no database, no clock).
import { Document, Text, View } from "@react-pdf/renderer";
import type { HouseEvaluation } from "@/calc/analyze";
import { costBasisNote, type ReportSnapshot } from "@/lib/documents/snapshot";
import { BigFigure, Facts, Heading, P, Table } from "./parts/blocks";
import { ChartFrame, Columns, CumulativeChart, PairedBars } from "./parts/charts";
import { CrewSection } from "./parts/crew";
import { registerFonts } from "./parts/fonts";
import { ReportPage } from "./parts/page";
import { PhotosSection } from "./parts/photos";
import * as t from "./parts/text";
import { colors, s } from "./parts/theme";

const CONTENT_W = 612 - 2 * 48;
const TITLE = "Savings report";

const FUEL_NAMES: Record<string, string> = {
  "natural-gas": "natural gas", oil: "heating oil", propane: "propane", "electric-resistance": "electric resistance", "heat-pump": "heat pump",
};
const COMPONENTS = [["walls", "Walls"], ["ceilings", "Ceilings"], ["floors", "Floors"], ["windows", "Windows"], ["doors", "Doors"]] as const;

/** Heat loss at design conditions per component (UA × ΔT; 1.08 × CFM_nat × ΔT for air leakage), as on screen. */
function heatLossByComponent(e: HouseEvaluation) {
  const dT = e.designLoad.deltaTF;
  return [...COMPONENTS.map(([k, label]) => ({ label, btuh: e.envelope.ua[k] * dT })), { label: "Air leakage", btuh: e.designLoad.infiltrationBtuh }];
}

/** Cumulative first-year savings at today's fuel price, each upgrade counted over its own life. */
export function cumulativeSavings(a: ReportSnapshot["analysis"]): number[] {
  const life = Math.max(0, ...a.upgrades.map((u) => u.lifeYears));
  const out = [0];
  for (let y = 1; y <= life; y++) out.push(out[y - 1] + a.upgrades.reduce((acc, u) => acc + (y <= u.lifeYears ? u.savings.usd : 0), 0));
  return out;
}

export function addressLine(s: ReportSnapshot) {
  const h = s.house;
  return `${h.street}, ${h.city}, ${h.state} ${h.postalCode}`;
}

function leakageCut(a: ReportSnapshot["analysis"]) {
  const before = a.baseline.cfm50;
  return before > 0 ? (before - a.final.cfm50) / before : 0;
}

function SmallFigure({ title, value, unit, detail }: { title: string; value: string; unit: string; detail: string }) {
  return (
    <View style={[s.card, { flex: 1 }]} wrap={false}>
      <Text style={{ fontWeight: 700, color: colors.muted, fontSize: 9 }}>{t.pdfText(title.toUpperCase())}</Text>
      <Text style={{ fontWeight: 600, color: colors.spruce800, marginTop: 3, marginBottom: 3 }}>
        <Text style={{ fontFamily: s.display.fontFamily, fontSize: 20, lineHeight: 1.15 }}>{t.pdfText(value)}</Text>
        {"\n"}
        {t.pdfText(unit)}
      </Text>
      <Text style={[s.small, { color: colors.charcoal }]}>{t.pdfText(detail)}</Text>
    </View>
  );
}

const SHARE_PARTS = [
  ["walls", "Walls", colors.ember600], ["infiltration", "Air leakage", colors.ember500], ["windows", "Windows", colors.spruce700],
  ["floors", "Floors", colors.spruce500], ["ceilings", "Ceilings", colors.warn], ["doors", "Doors", colors.muted],
] as const;

/** One bar split by each part's share of the design heat loss as found, with a legend. */
function ShareBar({ snapshot: sn }: { snapshot: ReportSnapshot }) {
  const share = sn.analysis.baseline.designLoad.share;
  const parts = SHARE_PARTS.map(([k, label, color]) => ({ label, color, v: share[k] })).filter((x) => x.v > 0);
  return (
    <View wrap={false}>
      <View style={{ flexDirection: "row", height: 16, borderRadius: 3, overflow: "hidden" }}>
        {parts.map((x) => <View key={x.label} style={{ width: `${x.v * 100}%`, backgroundColor: x.color }} />)}
      </View>
      <View style={{ flexDirection: "row", flexWrap: "wrap", alignItems: "center", marginTop: 5 }}>
        {parts.map((x) => [
          <View key={`${x.label}-key`} style={{ width: 8, height: 8, marginRight: 4, backgroundColor: x.color, borderRadius: 1.5 }} />,
          <Text key={x.label} style={{ fontSize: 9, marginRight: 12 }}>{t.pdfText(`${x.label} ${t.percent(x.v)}`)}</Text>,
        ])}
      </View>
      <Text style={[s.small, { marginTop: 3 }]}>Share of the heat the house loses on a cold day, as found.</Text>
    </View>
  );
}

function Summary({ snapshot: sn }: { snapshot: ReportSnapshot }) {
  const a = sn.analysis;
  const pkg = a.package;
  const cut = leakageCut(a);
  const measured = sn.leakageBasis === "measured";
  const loadCut = a.baseline.designLoad.totalBtuh > 0 ? 1 - a.final.designLoad.totalBtuh / a.baseline.designLoad.totalBtuh : 0;
  const draughtCut = a.baseline.infiltration.seasonal.cfm > 0 ? 1 - a.final.infiltration.seasonal.cfm / a.baseline.infiltration.seasonal.cfm : 0;
  const fuelName = FUEL_NAMES[a.input.heating.fuel] ?? a.input.heating.fuel;
  return (
    <>
      <Text style={s.h1}>Your savings report</Text>
      <Text style={{ fontSize: 12, fontWeight: 600, marginTop: 6 }}>{t.pdfText(addressLine(sn))}</Text>
      <Text style={[s.muted, { marginTop: 2 }]}>
        {t.pdfText(`Prepared for ${sn.client.name} by ${sn.issuedByName}, ${sn.company.name} · Issued ${t.date(sn.issuedAt)} · Version ${sn.version} · Job ${sn.job.number}`)}
      </Text>
      <P style={{ marginTop: 12, fontSize: 11 }}>
        {`We measured your ${sn.house.yearBuilt} house and worked out what the planned work would change. In short: the plan should cut your heating bill by about ${t.usd(pkg.savings.usd)} a year and pay for itself in ${t.years(pkg.simplePaybackYears)}.`}
      </P>
      <View style={{ flexDirection: "row", gap: 10, marginTop: 8 }}>
        <BigFigure label="Yearly saving" value={t.usd(pkg.savings.usd)} unit="a year" detail={`Heating cost ${t.usd(a.baseline.energy.costUSD)} now, ${t.usd(a.final.energy.costUSD)} after`} />
        <BigFigure
          label="Payback"
          value={pkg.simplePaybackYears === null ? "none" : t.num(pkg.simplePaybackYears, 1)}
          unit={pkg.simplePaybackYears === null ? "no saving" : "years"}
          detail={`on ${t.usd(pkg.costUSD)} of work`}
          tone="ember"
        />
        <BigFigure label="Leakage cut" value={t.percent(cut)} unit="less leakage" detail={`${t.cfm50Change(a.baseline.cfm50, a.final.cfm50)}${measured ? ", measured" : ""}`} />
      </View>
      <View style={{ flexDirection: "row", gap: 10, marginTop: 10 }}>
        <SmallFigure title="Fuel saved" value={t.fuel(pkg.savings.fuelUnits, pkg.savings.fuelUnit)} unit={`of ${fuelName} a year`} detail={`${t.energy(pkg.savings.mmbtu)} of fuel, and ${t.co2(pkg.savings.co2Lb)} less a year.`} />
        <SmallFigure
          title="Warmer on cold days"
          value={t.percent(loadCut)}
          unit="less heat needed"
          detail={`At ${t.temp(a.baseline.designLoad.outdoorF)} outside the house needs ${t.power(a.final.designLoad.totalBtuh)} instead of ${t.power(a.baseline.designLoad.totalBtuh)}, and walls and ceilings stay warmer to the touch.`}
        />
        <SmallFigure
          title="Fewer draughts"
          value={t.percent(draughtCut)}
          unit="less cold air leaking in"
          detail={`Outdoor air replaces the air in the house ${t.achNatural(a.final.infiltration.seasonal.ach)} times an hour instead of ${t.achNatural(a.baseline.infiltration.seasonal.ach)} over a heating season.`}
        />
      </View>
      <Heading ahead={60}>Where your heat goes today</Heading>
      <ShareBar snapshot={sn} />
      <Heading ahead={60}>What we plan to do</Heading>
      {a.upgrades.length === 0 ? <P>No upgrades are planned yet.</P> : null}
      {a.upgrades.map((u, i) => (
        <View key={i} style={{ flexDirection: "row", marginBottom: 4 }} wrap={false}>
          <Text style={{ width: 18, fontWeight: 700, color: colors.ember600 }}>{i + 1}.</Text>
          <Text style={{ flex: 1 }}>
            <Text style={s.bold}>{t.pdfText(u.name)}</Text>
            {t.pdfText(`: saves about ${t.usd(u.savings.usd)} a year for ${t.usd(u.costUSD)}, paying back in ${t.years(u.simplePaybackYears)}.`)}
          </Text>
        </View>
      ))}
      <View style={{ marginTop: 12, borderLeftWidth: 3, borderLeftColor: colors.ember500, paddingLeft: 8 }} wrap={false}>
        <Text style={[s.small, { color: colors.charcoal }]}>
          {t.pdfText(
            `These figures are estimates from a model of your house and typical weather; your bills will vary with the weather, fuel prices and how you use your home. ${measured ? "The leakage figures are measured: the after-work figure is the blower-door reading at test-out." : "The after-work leakage is the target for the air sealing; it is measured again at test-out."} All work follows local codes and licensed practice.`,
          )}
        </Text>
      </View>
    </>
  );
}

function Charts({ snapshot: sn }: { snapshot: ReportSnapshot }) {
  const a = sn.analysis;
  const before = heatLossByComponent(a.baseline);
  const after = heatLossByComponent(a.final);
  const rows = before.map((b, i) => ({ label: b.label, before: b.btuh, after: after[i].btuh }));
  const half = (CONTENT_W - 16) / 2;
  const steps = a.upgrades.slice(0, -1).map((u) => ({ label: `after ${u.name}`, value: u.after.annualCostUSD, tone: "step" as const }));
  const costColumns = [
    { label: "Now", value: a.baseline.energy.costUSD, tone: "before" as const },
    ...(steps.length <= 3 ? steps.map((x, i) => ({ ...x, label: `After step ${i + 1}` })) : []),
    { label: "After the plan", value: a.final.energy.costUSD, tone: "after" as const },
  ];
  const cumulative = cumulativeSavings(a);
  const measured = sn.leakageBasis === "measured";
  return (
    <>
      <Text style={s.h2}>What changes</Text>
      <ChartFrame
        title="Heat loss by part of the house, on a design day"
        legend={[["As found", colors.ember600], ["After the plan", colors.spruce700]]}
        caption={t.pdfText(`Btu per hour lost at ${t.temp(a.baseline.designLoad.outdoorF)} outside and ${t.temp(a.baseline.designLoad.indoorF)} inside.`)}
      >
        <PairedBars rows={rows} width={CONTENT_W} format={(v) => t.num(v)} />
      </ChartFrame>
      <View style={{ flexDirection: "row", gap: 16 }}>
        <ChartFrame width={half} title="Heating cost a year" caption={steps.length > 0 && steps.length <= 3 ? "Steps follow the numbered upgrades on page 1, in order." : "At today's fuel price."}>
          <Columns columns={costColumns} width={half} height={130} format={(v) => t.usd(v)} />
        </ChartFrame>
        <ChartFrame width={half} title="Air leakage (blower door, CFM50)" caption={measured ? "After: measured at test-out." : "After: the air-sealing target, measured at test-out."}>
          <Columns
            columns={[
              { label: "Test-in", value: a.baseline.cfm50, tone: "before" },
              { label: measured ? "Test-out" : "After the plan", value: a.final.cfm50, tone: "after" },
            ]}
            width={half}
            height={130}
            format={(v) => t.num(v)}
          />
        </ChartFrame>
      </View>
      <ChartFrame
        title="Savings add up against the cost of the work"
        legend={[["Savings so far", colors.spruce700], [`Cost of the plan, ${t.usd(a.package.costUSD)}`, colors.ember600]]}
        caption="Each upgrade's first-year saving at today's fuel price, counted over its expected life. Where the lines cross, the work has paid for itself."
      >
        <CumulativeChart points={cumulative} cost={a.package.costUSD} width={CONTENT_W} height={150} format={(v) => t.usd(v)} />
      </ChartFrame>
    </>
  );
}

function Upgrades({ snapshot: sn }: { snapshot: ReportSnapshot }) {
  const a = sn.analysis;
  const pkg = a.package;
  return (
    <>
      <Heading ahead={90}>Your upgrades</Heading>
      <P>Each saving is worked out on the house the earlier upgrades leave, so the savings add up to the whole plan.</P>
      <Table
        columns={[
          { title: "Upgrade", width: 31 },
          { title: "Cost", width: 11, align: "right" },
          { title: "Saving a year", width: 13, align: "right" },
          { title: "Fuel a year", width: 13, align: "right" },
          { title: "Payback", width: 12, align: "right" },
          { title: "SIR", width: 8, align: "right" },
          { title: "Life", width: 12, align: "right" },
        ]}
        rows={a.upgrades.map((u) => [u.name, t.usd(u.costUSD), t.usd(u.savings.usd), t.fuel(u.savings.fuelUnits, u.savings.fuelUnit), t.years(u.simplePaybackYears), t.sir(u.sir), `${u.lifeYears} years`])}
        foot={["Whole plan", t.usd(pkg.costUSD), t.usd(pkg.savings.usd), t.fuel(pkg.savings.fuelUnits, pkg.savings.fuelUnit), t.years(pkg.simplePaybackYears), t.sir(pkg.sir), ""]}
      />
      <P style={[s.small, { marginTop: 4 }]}>
        {`${costBasisNote(sn) ? `${costBasisNote(sn)} ` : ""}SIR is the savings-to-investment ratio: what an upgrade saves over its life, in today's money, divided by its cost. 1 or more means it repays its cost. Discount rate ${t.percent(a.input.economics.discountRate, 1)}, fuel price rising ${t.percent(a.input.economics.fuelEscalationRate, 1)} a year.`}
      </P>
    </>
  );
}

function MoistureVentilation({ snapshot: sn }: { snapshot: ReportSnapshot }) {
  const a = sn.analysis;
  const v = a.ventilation;
  const dew = a.moisture.after[0]?.dewPointF ?? a.moisture.before[0]?.dewPointF ?? 0;
  const risky = a.moisture.after.some((m) => m.atRisk.length > 0);
  const verdict = (x: typeof v.after) => (x.needsFan ? `a fan is needed: ${t.flow(x.fanCfm)} continuous` : "no fan is needed");
  return (
    <>
      <View wrap={false}>
        <Heading>Moisture and fresh air</Heading>
        <Text style={s.h3}>Fresh air (ASHRAE 62.2-2016)</Text>
        <View style={[s.card, { backgroundColor: v.after.needsFan ? colors.warnBg : colors.spruce50, marginBottom: 6 }]} wrap={false}>
          <Text style={{ fontWeight: 700, color: v.after.needsFan ? colors.warn : colors.spruce800 }}>{t.pdfText(`After the plan, ${verdict(v.after)}.`)}</Text>
          <Text>{t.pdfText(`The house needs ${t.flow(v.after.qTotCfm, 1)} of outdoor air; after the work, leakage supplies about ${t.flow(v.after.qInfCfm, 1)}. As found: ${verdict(v.before)} (leakage about ${t.flow(v.before.qInfCfm, 1)}).`)}</Text>
          {v.after.needsFan && !v.before.needsFan ? <Text style={{ marginTop: 3 }}>Tightening the house takes it below the whole-house rate: a continuous exhaust or balanced fan goes in with the air sealing.</Text> : null}
        </View>
      </View>
      <View wrap={false}>
        <Text style={s.h3}>Moisture in walls and ceilings after the work</Text>
        <P style={s.small}>
          {`A screening check at design conditions (${t.temp(a.baseline.designLoad.outdoorF)} outside, ${t.temp(a.input.indoorTempF)} and ${t.percent(a.input.indoorRH)} relative humidity inside, so an indoor dew point of ${t.temp(dew)}): is any layer colder than the dew point, where moist indoor air could condense? It is not a hygrothermal simulation.`}
        </P>
        <Table
          fontSize={8.5}
          columns={[{ title: "Assembly", width: 46 }, { title: "Layers colder than the dew point", width: 54 }]}
          rows={a.moisture.after.map((m) => [m.assemblyName, m.atRisk.length === 0 ? "None" : m.atRisk.map((x) => `${x.outerLayer}, inner face (${t.temp(x.tempF)})`).join("; ")])}
        />
        {risky ? (
          <P style={{ marginTop: 5 }}>
            Where a layer is colder than the dew point, the interior side is kept airtight (air sealing, sealed plaster, gaskets at boxes and fixtures) and the outside is left free to dry: no new vapour-tight layer goes on the outside.
          </P>
        ) : null}
      </View>
    </>
  );
}

function CautionCard({ c: x }: { c: ReportSnapshot["analysis"]["cautions"][number] }) {
  return (
    <View style={{ width: "49%", marginBottom: 7, padding: 7, backgroundColor: colors.ember50, borderRadius: 3 }} wrap={false}>
      <Text style={{ fontWeight: 700, color: colors.ember700 }}>{t.pdfText(x.hazard)}</Text>
      <Text style={[s.small, { marginBottom: 2 }]}>{t.pdfText(`Why: ${x.because}`)}</Text>
      <Text style={{ fontSize: 9 }}>{t.pdfText(x.message)}</Text>
      <Text style={[s.small, { marginTop: 2 }]}>{t.pdfText(`Governing document: ${x.document}`)}</Text>
    </View>
  );
}

/** Cautions two to a row; the heading stays with the first row. */
function Cautions({ snapshot: sn }: { snapshot: ReportSnapshot }) {
  const c = sn.analysis.cautions;
  const rows: (typeof c)[] = [];
  for (let i = 0; i < c.length; i += 2) rows.push(c.slice(i, i + 2));
  const row = (r: typeof c, key: number) => (
    <View key={key} style={{ flexDirection: "row", justifyContent: "space-between" }} wrap={false}>
      {r.map((x) => <CautionCard key={x.id} c={x} />)}
    </View>
  );
  return (
    <>
      <View wrap={false}>
        <Heading>Safety during the work</Heading>
        {c.length === 0 ? <P>No cautions apply to this house and plan.</P> : <P>What the crew does because of what we found in your house.</P>}
        {rows.slice(0, 1).map((r) => row(r, 0))}
      </View>
      {rows.slice(1).map((r, i) => row(r, i + 1))}
    </>
  );
}

function How({ snapshot: sn }: { snapshot: ReportSnapshot }) {
  const a = sn.analysis;
  const h = a.input;
  const eff = h.heating.efficiency;
  const effText = eff.kind === "afue" ? `${t.percent(eff.value)} AFUE` : `${t.num(eff.value, 2)} ${eff.kind.toUpperCase()}`;
  const testOut = h.blowerDoor.cfm50TestOut;
  const inputs: [string, string][] = [
    ["House", `built ${h.yearBuilt}, ${h.stories} storeys, ${t.area(h.floorAreaFt2)} conditioned, ${t.volume(h.volumeFt3)}, ${h.bedrooms} bedrooms`],
    ["Heating", `${FUEL_NAMES[h.heating.fuel] ?? h.heating.fuel}, ${effText}, ${t.usdCents(h.heating.pricePerUnitUSD)} per ${a.baseline.energy.fuelUnit}`],
    ["Indoors", `${t.temp(h.indoorTempF)} at ${t.percent(h.indoorRH)} relative humidity`],
    ["Climate", a.climate.name],
    ["Heating degree days", t.degreeDays(a.climate.hdd65)],
    ["Design temperature", `${t.temp(a.climate.heatingDesignTempF)} (${a.climate.designPercentile} % design condition)`],
    ["Blower door, test-in", t.cfm50(h.blowerDoor.cfm50TestIn)],
    ...(testOut !== undefined ? [["Blower door, test-out", `${t.cfm50(testOut)} (measured)`] as [string, string]] : []),
    ["Surfaces", `${h.surfaces.length} walls, ceilings and floors; total UA ${t.ua(a.baseline.envelope.totalUA)} as found, ${t.ua(a.final.envelope.totalUA)} after`],
    ["Heating cost", `${t.usd(a.baseline.energy.costUSD)} a year as found (${t.fuel(a.baseline.energy.fuelUnits, a.baseline.energy.fuelUnit)}), ${t.usd(a.final.energy.costUSD)} after`],
    ["Economics", `discount rate ${t.percent(h.economics.discountRate, 1)}, fuel price escalation ${t.percent(h.economics.fuelEscalationRate, 1)} a year`],
  ];
  return (
    <>
      <View wrap={false}>
        <Heading>How we calculated this</Heading>
        <Text style={s.h3}>Inputs</Text>
        <Facts items={inputs.slice(0, 4)} labelWidth={26} />
      </View>
      <Facts items={inputs.slice(4)} labelWidth={26} />
      <Text style={s.h3} minPresenceAhead={40}>Climate data</Text>
      <P style={s.small}>{`${a.climate.degreeDaySource}. ${a.climate.designSource}.`}</P>
      {a.warnings.length > 0 ? (
        <View wrap={false}>
          <Text style={s.h3}>Notes on the inputs</Text>
          {a.warnings.map((w, i) => <P key={i} style={s.small}>{w.message}</P>)}
        </View>
      ) : null}
      <Text style={s.h3} minPresenceAhead={60}>Methods and sources</Text>
      <Table
        fontSize={8.5}
        columns={[{ title: "Figure", width: 17 }, { title: "Method", width: 45 }, { title: "Source", width: 38 }]}
        rows={a.methods.map((m) => [m.topic, m.method, m.source])}
      />
      <View style={{ marginTop: 10, padding: 10, backgroundColor: colors.paperDeep, borderRadius: 4 }} wrap={false}>
        <Text style={{ fontWeight: 700, marginBottom: 2 }}>These figures are estimates</Text>
        <Text>
          {t.pdfText(
            `They come from handbook methods applied to the measurements we took, with typical weather for ${a.climate.name}. Actual savings depend on the weather, fuel prices and how the house is lived in. ${sn.leakageBasis === "measured" ? "The leakage figures are measured: the after-work air leakage is the blower-door reading taken at test-out." : "The after-work air leakage is a target; it is measured with a blower door at test-out and this report is then re-issued."} All work follows local codes and licensed practice; where a code, an inspector or a licensed trade says otherwise, they govern.`,
          )}
        </Text>
      </View>
    </>
  );
}

/** The savings report's pages, for its own document or appended to a proposal. */
export function SavingsReportPages({ snapshot, images = {} }: { snapshot: ReportSnapshot; images?: Record<string, Buffer> }) {
  registerFonts();
  const dp = snapshot.analysis.input.densePack;
  const frame = { companyName: snapshot.company.name, documentTitle: `${TITLE} · ${snapshot.client.name} · ${addressLine(snapshot)}` };
  return (
    <>
      <ReportPage {...frame}>
        <Summary snapshot={snapshot} />
      </ReportPage>
      <ReportPage {...frame}>
        <Charts snapshot={snapshot} />
      </ReportPage>
      <ReportPage {...frame}>
        {snapshot.crewSummary ? <CrewSection crew={snapshot.crewSummary} thresholds={{ high: dp.highRatio, low: dp.lowRatio }} /> : null}
        <Upgrades snapshot={snapshot} />
        <MoistureVentilation snapshot={snapshot} />
        <Cautions snapshot={snapshot} />
        <How snapshot={snapshot} />
      </ReportPage>
      {snapshot.photos?.length ? (
        <ReportPage {...frame}>
          <PhotosSection photos={snapshot.photos} images={images} />
        </ReportPage>
      ) : null}
    </>
  );
}

export function SavingsReportDocument({ snapshot, images }: { snapshot: ReportSnapshot; images?: Record<string, Buffer> }) {
  registerFonts();
  return (
    <Document title={t.pdfText(`${TITLE}, ${addressLine(snapshot)}`)} author={t.pdfText(snapshot.company.name)} subject={`Version ${snapshot.version}`} creator="Warmstead" producer="Warmstead" language="en-US">
      <SavingsReportPages snapshot={snapshot} images={images} />
    </Document>
  );
}
