import { useId } from "react";
import { defaultFramingFraction, type AssemblyDef, type FramedLayerSpec } from "@/calc/assemblies";
import { isFramed } from "./model";
import { bandKind, describeSection, drawnThicknessIn, layerName, layoutBands, numberRows } from "./section-geometry";
import { bandFill, SectionPatterns } from "./section-patterns";

const W = 600;
const TOP = 100;
const HB = 220;
const MIN_W = 18;

const clamp = (x: number, lo: number, hi: number) => (Number.isFinite(x) ? Math.min(hi, Math.max(lo, x)) : lo);

/** The framed band in plan: a stud across the middle, cavity above and below, fill against the stud. */
function FramedBand({ x, w, spec, def, p }: { x: number; w: number; spec: FramedLayerSpec; def: AssemblyDef; p: string }) {
  const steel = (spec.framingMaterial ?? (def.construction === "steel-frame" ? "steel" : "wood")) === "steel";
  const spacing = spec.spacingIn !== undefined && spec.spacingIn > 0 ? spec.spacingIn : 16;
  const ff = clamp(spec.framingFraction ?? defaultFramingFraction(def.kind, spacing, steel ? "steel" : "wood").value, 0.06, 0.8);
  const phi = spec.cavityFill === null ? 0 : clamp(spec.fillFraction ?? 1, 0, 1);
  const sh = ff * HB;
  const cav = (HB - sh) / 2;
  const sTop = TOP + (HB - sh) / 2;
  const fillH = phi * cav;
  return (
    <>
      {fillH > 0 ? (
        <>
          <rect x={x} y={sTop - fillH} width={w} height={fillH} fill={`url(#${p}-insulation)`} data-part="fill" />
          <rect x={x} y={sTop + sh} width={w} height={fillH} fill={`url(#${p}-insulation)`} data-part="fill" />
        </>
      ) : null}
      <rect x={x} y={sTop} width={w} height={sh} fill={steel ? undefined : `url(#${p}-wood)`} className={steel ? "fill-ink-muted" : undefined} data-part="framing" />
      {steel ? null : <path d={`M${x} ${sTop}L${x + w} ${sTop + sh}M${x + w} ${sTop}L${x} ${sTop + sh}`} className="stroke-charcoal" strokeWidth="1.5" />}
      <rect x={x} y={sTop} width={w} height={sh} fill="none" className="stroke-charcoal" strokeWidth="1.5" />
    </>
  );
}

/** A drawing of the section, outside on the left; widths follow thickness (films get a minimum). */
export function LayerSection({ value, className }: { value: AssemblyDef; className?: string }) {
  const p = `ls${useId().replace(/[^a-zA-Z0-9]/g, "")}`;
  const layers = Array.isArray(value.layers) ? value.layers : [];
  const bands = layoutBands(layers.map(drawnThicknessIn), W, MIN_W);
  const rows = numberRows(bands, 26);
  return (
    <svg viewBox={`0 0 ${W} ${TOP + HB + 8}`} role="img" aria-label={describeSection({ ...value, layers })} className={className ?? "block h-auto w-full max-w-3xl"}>
      <SectionPatterns p={p} />
      <text x="2" y="22" fontSize="18" fontWeight="600" className="fill-ink-muted">← Outside (cold side)</text>
      <text x={W - 2} y="22" fontSize="18" fontWeight="600" textAnchor="end" className="fill-ink-muted">Inside (heated side) →</text>
      {layers.map((l, i) => {
        const { x, w } = bands[i];
        const kind = bandKind(l);
        const cx = x + w / 2;
        const name = layerName(l, value.construction);
        const max = Math.floor((HB - 16) / 9.4);
        const first = name.split(", ")[0];
        const short = first.length > max ? `${first.slice(0, max - 1)}…` : first;
        return (
          <g key={i} data-band={i} data-kind={kind}>
            <title>{`${i + 1}. ${name}`}</title>
            {isFramed(l) ? (
              <>
                <rect x={x} y={TOP} width={w} height={HB} {...bandFill(kind, p)} />
                <FramedBand x={x} w={w} spec={l.framed} def={value} p={p} />
              </>
            ) : (
              <rect x={x} y={TOP} width={w} height={HB} {...bandFill(kind, p)} />
            )}
            <rect x={x} y={TOP} width={w} height={HB} fill="none" className="stroke-charcoal" strokeWidth="1" strokeDasharray={kind === "film" ? "4 3" : undefined} />
            <text x={cx} y={rows[i] === 0 ? 56 : 88} fontSize="20" fontWeight="700" textAnchor="middle" className="fill-charcoal">{i + 1}</text>
            {w >= 40 ? (
              <text transform={`translate(${cx} ${TOP + HB / 2}) rotate(-90)`} fontSize="18" textAnchor="middle" dominantBaseline="central"
                className="fill-charcoal stroke-white" strokeWidth="4" paintOrder="stroke">{short}</text>
            ) : null}
          </g>
        );
      })}
    </svg>
  );
}
