import path from "node:path";

/** Reference data of ../shared/data, read in place (never copied into the project). */
export const SHARED = path.resolve(__dirname, "../../../shared/data");
export const dataPath = (...p: string[]) => path.join(SHARED, ...p);

/** Relative difference. */
export const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/**
 * IP R per SI R by hand, from unit definitions (NIST SP 811): 1 ft = 0.3048 m, 1 °F = 5/9 K,
 * 1 Btu (IT) = 1055.05585262 J, 1 h = 3600 s → 1 h·ft²·°F/Btu = 0.3048² × (5/9) / (1055.05585262/3600) m²·K/W.
 */
export const R_SI_PER_IP = (0.3048 ** 2 * (5 / 9)) / (1055.05585262 / 3600);
export const R_IP_PER_SI = 1 / R_SI_PER_IP; // ≈ 5.6783

/** Minimal CSV reader for stations.csv (quoted fields allowed). */
export function parseCsv(text: string): Record<string, string>[] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = "";
  let q = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (q) { if (c === '"' && text[i + 1] === '"') { cell += '"'; i++; } else if (c === '"') q = false; else cell += c; }
    else if (c === '"') q = true;
    else if (c === ",") { row.push(cell); cell = ""; }
    else if (c === "\n") { row.push(cell); rows.push(row); row = []; cell = ""; }
    else if (c !== "\r") cell += c;
  }
  if (cell || row.length) { row.push(cell); rows.push(row); }
  const [head, ...body] = rows;
  return body.filter((r) => r.length > 1).map((r) => Object.fromEntries(head.map((h, i) => [h, r[i] ?? ""])));
}
