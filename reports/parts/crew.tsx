// "What the crew did": the crew log frozen into the savings report at issue — bags used against
// the estimate in total and per wall, every warning and how it ended, and the test-out reading.
import { Text, View } from "@react-pdf/renderer";
import { bagsFigure, wallCheckText, warningOutcomeText } from "@/lib/documents/crew-summary";
import type { CrewSummarySnapshot } from "@/lib/documents/snapshot";
import { BigFigure, Heading, P, Table } from "./blocks";
import * as t from "./text";
import { colors, s } from "./theme";

export function CrewSection({ crew, thresholds }: { crew: CrewSummarySnapshot; thresholds: { high: number; low: number } }) {
  const b = crew.bags;
  const to = crew.testOut;
  return (
    <>
      <View wrap={false}>
        <Heading>What the crew did</Heading>
        <P>{`From the crew's log of ${crew.entries} ${crew.entries === 1 ? "entry" : "entries"}, as it stood when this report was issued. The estimate is the bag count worked out from the wall cavities before the work.`}</P>
        <View style={{ flexDirection: "row", gap: 10, marginBottom: 6 }}>
          <BigFigure label="Insulation blown" value={bagsFigure(b.logged)} unit={`of about ${bagsFigure(b.expected)} bags estimated`} detail={b.ratio !== null ? `${t.num(b.ratio, 2)} times the estimate · ${crew.wallsFinished} of ${crew.wallsTotal} walls finished` : `${crew.wallsFinished} of ${crew.wallsTotal} walls finished`} />
          {to ? (
            <BigFigure
              label="Air leakage at test-out"
              value={t.num(to.measuredCfm50)}
              unit="CFM50 measured"
              detail={`${to.predictedCfm50 !== null ? `Predicted ${t.num(to.predictedCfm50)} CFM50` : "No prediction"}${to.testInCfm50 !== null ? `; ${t.num(to.testInCfm50)} CFM50 at test-in` : ""}${to.measuredReductionPct !== null ? `, ${t.num(to.measuredReductionPct)}\u00a0% less` : ""}. Tested ${t.date(to.testedAt)}.`}
              tone="ember"
            />
          ) : null}
        </View>
      </View>
      <Table
        columns={[{ title: "Wall", width: 40 }, { title: "Bags blown", width: 18, align: "right" }, { title: "Estimate", width: 17, align: "right" }, { title: "Check", width: 25 }]}
        rows={crew.perWall.map((w) => [`${w.name}${w.finished ? " (finished)" : ""}`, bagsFigure(w.loggedBags), bagsFigure(w.expectedBags), `${w.ratio !== null && w.loggedBags > 0 ? `${t.num(w.ratio, 2)}x, ` : ""}${wallCheckText(w)}`])}
        foot={["All walls", bagsFigure(b.logged), bagsFigure(b.expected), b.ratio !== null ? `${t.num(b.ratio, 2)}x` : ""]}
      />
      <View wrap={false}>
        <Text style={s.h3}>{`Warnings raised (${crew.warnings.length})`}</Text>
        {crew.warnings.length === 0 ? <P>None: every wall stayed within the expected range.</P> : null}
      </View>
      {crew.warnings.map((w, i) => (
        <View key={i} style={{ marginBottom: 4, paddingLeft: 8, borderLeftWidth: 2, borderLeftColor: w.state === "open" ? colors.ember600 : colors.spruce500 }} wrap={false}>
          <Text>
            <Text style={s.bold}>{t.pdfText(`${w.wall}: ${w.kind === "overfill" ? "more material than expected" : "less material than expected"}`)}</Text>
            {t.pdfText(` at ${bagsFigure(w.bagsAtRaise)} bags, ${t.date(w.raisedAt)} — ${warningOutcomeText(w)}.`)}
          </Text>
        </View>
      ))}
      <P style={[s.small, { marginTop: 4 }]}>
        {`A wall that takes much more than its estimate may be losing material into an attic, chase, soffit or basement; one that finishes well under may have voids or low density. The crew stops, looks, and probes or re-blows. The checks flag a wall above ${t.num(thresholds.high, 2)} times or, once finished, below ${t.num(thresholds.low, 2)} times its estimate (common practice).`}
      </P>
    </>
  );
}
