// The proposal as a PDF: the priced line items, totals, deposit, validity, terms and the
// company's licence and insurance, then the savings report's pages appended in the same file.
import { Document, Text, View } from "@react-pdf/renderer";
import { taxRatePpmOf, type ReportSnapshot } from "@/lib/documents/snapshot";
import { Heading, P, Table } from "./parts/blocks";
import { registerFonts } from "./parts/fonts";
import { ReportPage } from "./parts/page";
import * as t from "./parts/text";
import { colors, s } from "./parts/theme";
import { addressLine, SavingsReportPages } from "./savings-report";

const TITLE = "Proposal";

const qty = (q: number) => t.num(q, Number.isInteger(q) ? 0 : 2);

function Party({ title, lines }: { title: string; lines: (string | null | undefined)[] }) {
  return (
    <View style={{ flex: 1 }}>
      <Text style={{ fontSize: 8.5, fontWeight: 700, color: colors.muted, letterSpacing: 0.5, marginBottom: 2 }}>{title.toUpperCase()}</Text>
      {lines.filter((l): l is string => !!l).map((l, i) => (
        <Text key={i} style={i === 0 ? s.semibold : undefined}>{t.pdfText(l)}</Text>
      ))}
    </View>
  );
}

function TotalRow({ label, value, strong = false }: { label: string; value: string; strong?: boolean }) {
  return (
    <View style={{ flexDirection: "row", justifyContent: "space-between", paddingVertical: strong ? 4 : 2, borderTopWidth: strong ? 1 : 0, borderTopColor: colors.charcoal }}>
      <Text style={strong ? { fontWeight: 700, fontSize: 12 } : s.muted}>{t.pdfText(label)}</Text>
      <Text style={strong ? { fontFamily: s.display.fontFamily, fontWeight: 700, fontSize: 16, color: colors.spruce800 } : { fontWeight: 600 }}>{t.pdfText(value)}</Text>
    </View>
  );
}

function ProposalBody({ snapshot: sn }: { snapshot: ReportSnapshot }) {
  const p = sn.proposal;
  const c = sn.company;
  const a = sn.analysis;
  if (!p) {
    return (
      <View>
        <Text style={s.h1}>Proposal</Text>
        <P style={{ marginTop: 12 }}>This proposal has no priced line items.</P>
      </View>
    );
  }
  const balance = p.totalCents - p.depositCents;
  const terms = p.terms.split(/\n\s*\n|\n/).map((x) => x.trim()).filter(Boolean);
  return (
    <View>
      <View style={{ flexDirection: "row", justifyContent: "space-between", alignItems: "flex-end" }}>
        <View>
          <Text style={s.h1}>Proposal</Text>
          <Text style={{ fontSize: 12, fontWeight: 600, marginTop: 4 }}>{t.pdfText(addressLine(sn))}</Text>
        </View>
        <View style={{ alignItems: "flex-end" }}>
          <Text style={s.muted}>{t.pdfText(`Job ${sn.job.number} · Version ${sn.version}`)}</Text>
          <Text style={s.muted}>{t.pdfText(`Issued ${t.date(sn.issuedAt)}`)}</Text>
          <Text style={{ fontWeight: 700, color: colors.ember700 }}>{t.pdfText(`Valid until ${t.date(p.validUntil)}`)}</Text>
        </View>
      </View>
      <View style={{ flexDirection: "row", gap: 16, marginTop: 14, paddingVertical: 8, borderTopWidth: 0.75, borderBottomWidth: 0.75, borderColor: colors.line }}>
        <Party title="From" lines={[c.name, c.address, c.phone, c.email]} />
        <Party title="For" lines={[sn.client.name, sn.house.street, `${sn.house.city}, ${sn.house.state} ${sn.house.postalCode}`]} />
        <Party title="Prepared by" lines={[sn.issuedByName, sn.job.title]} />
      </View>
      <P style={{ marginTop: 10 }}>
        {`Here is the work we propose for your house and what it costs. The savings report that follows this proposal shows what the work should save: about ${t.usd(a.package.savings.usd)} a year, paying back in ${t.years(a.package.simplePaybackYears)}.`}
      </P>
      <Heading ahead={80}>The work and its price</Heading>
      <Table
        columns={[
          { title: "Description", width: 46 },
          { title: "Quantity", width: 11, align: "right" },
          { title: "Unit", width: 11 },
          { title: "Unit price", width: 15, align: "right" },
          { title: "Total", width: 17, align: "right" },
        ]}
        rows={p.lines.map((l) => [l.description, qty(l.quantity), l.unit, t.dollars(l.unitPriceCents), t.dollars(l.totalCents)])}
      />
      {p.upgradesCents !== undefined ? <P style={[s.small, { marginTop: 4 }]}>{`The upgrade lines add up to ${t.dollars(p.upgradesCents)} before tax: the same cost the savings report uses for payback and SIR.`}</P> : null}
      <View style={{ flexDirection: "row", marginTop: 8 }} wrap={false}>
        <View style={{ flex: 1, paddingRight: 24 }}>
          <View style={[s.card, { backgroundColor: colors.spruce50 }]}>
            <Text style={{ fontWeight: 700, color: colors.spruce800 }}>Deposit</Text>
            <Text>{t.pdfText(`${t.dollars(p.depositCents)} is due when you accept, to book the crew. The balance of ${t.dollars(balance)} is due when the work is finished and tested out.`)}</Text>
          </View>
        </View>
        <View style={{ width: 220 }}>
          <TotalRow label="Subtotal" value={t.dollars(p.subtotalCents)} />
          <TotalRow label={`Tax at ${t.taxRate(taxRatePpmOf(p))}`} value={t.dollars(p.taxCents)} />
          <TotalRow label="Total" value={t.dollars(p.totalCents)} strong />
          <TotalRow label="Deposit on acceptance" value={t.dollars(p.depositCents)} />
          <TotalRow label="Balance on completion" value={t.dollars(balance)} />
        </View>
      </View>
      <Heading ahead={60}>Terms</Heading>
      {terms.map((x, i) => <P key={i} style={{ fontSize: 9 }}>{x}</P>)}
      <P style={{ fontSize: 9 }}>{`This proposal is valid until ${t.date(p.validUntil)}. Prices hold for work booked by then.`}</P>
      {c.licenseLine || c.insuranceLine ? (
        <View style={{ marginTop: 4 }} wrap={false}>
          {c.licenseLine ? <Text style={s.small}>{t.pdfText(c.licenseLine)}</Text> : null}
          {c.insuranceLine ? <Text style={s.small}>{t.pdfText(c.insuranceLine)}</Text> : null}
        </View>
      ) : null}
      <View style={{ marginTop: 14, padding: 12, borderWidth: 1.5, borderColor: colors.ember500, borderRadius: 5 }} wrap={false}>
        <Text style={{ fontFamily: s.display.fontFamily, fontWeight: 600, fontSize: 14, color: colors.ember700 }}>To accept this proposal</Text>
        <Text style={{ marginTop: 3 }}>
          {t.pdfText(`Accept in your Warmstead portal: open this proposal (version ${sn.version}), type your name and confirm. We record your acceptance with this exact version, then ask for the deposit. Questions first? Call or write to ${c.name}${c.phone ? ` at ${c.phone}` : ""}${c.email ? `, ${c.email}` : ""}.`)}
        </Text>
      </View>
    </View>
  );
}

/** Proposal pages, then the savings report pages (from `report` when given, else the proposal's own snapshot). */
export function ProposalDocument({ snapshot, report, images }: { snapshot: ReportSnapshot; report?: ReportSnapshot; images?: Record<string, Buffer> }) {
  registerFonts();
  return (
    <Document title={t.pdfText(`${TITLE}, ${addressLine(snapshot)}`)} author={t.pdfText(snapshot.company.name)} subject={`Version ${snapshot.version}`} creator="Warmstead" producer="Warmstead" language="en-US">
      <ReportPage companyName={snapshot.company.name} documentTitle={`${TITLE} · ${snapshot.client.name} · ${addressLine(snapshot)}`}>
        <ProposalBody snapshot={snapshot} />
      </ReportPage>
      <SavingsReportPages snapshot={report ?? snapshot} images={images} />
    </Document>
  );
}
