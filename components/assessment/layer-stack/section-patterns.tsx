import type { BandKind } from "./section-geometry";

/** Drafting-style fills: diagonal hatch for boards, loops for insulation, courses for masonry, grain for wood. */
export function SectionPatterns({ p }: { p: string }) {
  return (
    <defs>
      <pattern id={`${p}-board`} width="10" height="10" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <rect width="10" height="10" className="fill-white" />
        <line x1="0" y1="0" x2="0" y2="10" className="stroke-ink-muted" strokeWidth="1.5" />
      </pattern>
      <pattern id={`${p}-siding`} width="12" height="12" patternUnits="userSpaceOnUse" patternTransform="rotate(-45)">
        <rect width="12" height="12" className="fill-spruce-50" />
        <line x1="0" y1="0" x2="0" y2="12" className="stroke-spruce-600" strokeWidth="2" />
      </pattern>
      <pattern id={`${p}-masonry`} width="40" height="24" patternUnits="userSpaceOnUse">
        <rect width="40" height="24" className="fill-ember-50" />
        <path d="M0 0H40M0 12H40M10 0V12M30 12V24" className="stroke-ember-700" strokeWidth="1.5" fill="none" />
      </pattern>
      <pattern id={`${p}-insulation`} width="24" height="24" patternUnits="userSpaceOnUse">
        <rect width="24" height="24" className="fill-ember-100" />
        <path d="M0 12 C4 0, 8 0, 12 12 S20 24, 24 12" className="stroke-ember-500" strokeWidth="2" fill="none" />
      </pattern>
      <pattern id={`${p}-wood`} width="30" height="14" patternUnits="userSpaceOnUse">
        <rect width="30" height="14" className="fill-paper-deep" />
        <path d="M0 7 Q7.5 3 15 7 T30 7" className="stroke-ember-700" strokeWidth="1" fill="none" opacity="0.6" />
      </pattern>
      <pattern id={`${p}-air`} width="16" height="16" patternUnits="userSpaceOnUse">
        <rect width="16" height="16" className="fill-white" />
        <circle cx="8" cy="8" r="1.3" className="fill-spruce-200" />
      </pattern>
    </defs>
  );
}

/** Fill of a band: a pattern id, or a plain class for films and membranes. */
export function bandFill(kind: BandKind, p: string): { fill?: string; className?: string } {
  if (kind === "film") return { className: "fill-spruce-50" };
  if (kind === "membrane") return { className: "fill-charcoal" };
  if (kind === "framed") return { fill: `url(#${p}-air)` };
  return { fill: `url(#${p}-${kind})` };
}

export const BAND_NOTE: Record<BandKind, string> = {
  film: "air film", air: "air space", board: "board", siding: "siding", masonry: "masonry",
  insulation: "insulation", membrane: "membrane", wood: "solid wood", framed: "framing and cavity",
};
