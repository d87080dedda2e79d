// Crew-log check: bags actually blown into a wall against the dense-pack estimate.

// Above 1.3× expected suggests material escaping into a bypass (common practice, METHODS.md §5)
export const DEFAULT_HIGH_RATIO = 1.3;
// Below 0.8× expected suggests voids or low density (common practice, METHODS.md §5)
export const DEFAULT_LOW_RATIO = 0.8;

export type CrewStatus = "as-expected" | "possible-bypass" | "possible-voids-or-low-density" | "no-estimate";
export interface CrewCheck { surfaceId: string; surfaceName: string; expectedBags: number; actualBags: number; ratio: number | null; status: CrewStatus; message: string }

export function checkWall(surfaceId: string, surfaceName: string, expectedBags: number, actualBags: number, high = DEFAULT_HIGH_RATIO, low = DEFAULT_LOW_RATIO): CrewCheck {
  if (!(expectedBags > 0)) return { surfaceId, surfaceName, expectedBags, actualBags, ratio: null, status: "no-estimate", message: `${surfaceName}: the estimate expects no cavity to fill, so ${actualBags} bags cannot be compared.` };
  const ratio = actualBags / expectedBags;
  const r = ratio.toFixed(2);
  const counts = `${actualBags} bags against about ${expectedBags.toFixed(1)} expected (${r}×)`;
  if (ratio > high)
    return { surfaceId, surfaceName, expectedBags, actualBags, ratio, status: "possible-bypass", message: `${surfaceName} took ${counts}. Possible bypass: material may be escaping into an attic, a plumbing chase, a dropped soffit or the basement. Find where before closing the holes.` };
  if (ratio < low)
    return { surfaceId, surfaceName, expectedBags, actualBags, ratio, status: "possible-voids-or-low-density", message: `${surfaceName} took ${counts}. Possible voids or low density: check the fill (infrared camera or probing) and re-blow any bay that is short.` };
  return { surfaceId, surfaceName, expectedBags, actualBags, ratio, status: "as-expected", message: `${surfaceName} took ${counts}, within the expected range.` };
}
