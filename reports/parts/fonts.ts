// Fonts for the PDFs: the WOFF files shipped in fonts/ (WOFF2 does not load in React-PDF), read
// by absolute path so the renderer finds them from any working directory the server starts in.
//
// fontkit inflates a WOFF table every time it reads one (for the glyph table, once per glyph per
// render), which made a report render spend ~40 % of its time in zlib. So each WOFF is unpacked
// once per process into the plain sfnt (TrueType/OpenType) font it wraps — the same tables, byte
// for byte — and registered as a data URL.
import { readFileSync } from "node:fs";
import path from "node:path";
import { inflateSync } from "node:zlib";
import { Font } from "@react-pdf/renderer";

export const BODY = "Source Sans 3";
export const DISPLAY = "Fraunces";

/** A WOFF 1.0 file → the sfnt it contains (W3C WOFF File Format 1.0, §4–§6). */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.toString("latin1", 0, 4) !== "wOFF") throw new Error("not a WOFF file");
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables: { tag: Buffer; checksum: number; data: Buffer }[] = [];
  for (let i = 0; i < numTables; i++) {
    const e = 44 + i * 20;
    const offset = woff.readUInt32BE(e + 4);
    const compLength = woff.readUInt32BE(e + 8);
    const origLength = woff.readUInt32BE(e + 12);
    const raw = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(raw) : Buffer.from(raw);
    if (data.length !== origLength) throw new Error(`WOFF table ${woff.toString("latin1", e, e + 4)}: ${data.length} bytes, expected ${origLength}`);
    tables.push({ tag: woff.subarray(e, e + 4), checksum: woff.readUInt32BE(e + 16), data });
  }
  const entrySelector = Math.floor(Math.log2(numTables));
  const searchRange = 2 ** entrySelector * 16;
  const headerSize = 12 + numTables * 16;
  const pad4 = (n: number) => (n + 3) & ~3;
  const total = tables.reduce((a, t) => a + pad4(t.data.length), headerSize);
  const out = Buffer.alloc(total);
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(searchRange, 6);
  out.writeUInt16BE(entrySelector, 8);
  out.writeUInt16BE(numTables * 16 - searchRange, 10);
  let at = headerSize;
  tables.forEach((t, i) => {
    const r = 12 + i * 16;
    t.tag.copy(out, r);
    out.writeUInt32BE(t.checksum, r + 4);
    out.writeUInt32BE(at, r + 8);
    out.writeUInt32BE(t.data.length, r + 12);
    t.data.copy(out, at);
    at += pad4(t.data.length);
  });
  return out;
}

/** Absolute path of a shipped font file. */
export const fontFile = (name: string) => path.join(process.cwd(), "fonts", name);

const src = (name: string) => `data:font/sfnt;base64,${woffToSfnt(readFileSync(fontFile(name))).toString("base64")}`;

let registered = false;

/** Registers the body and display faces once per process. */
export function registerFonts() {
  if (registered) return;
  registered = true;
  Font.register({
    family: BODY,
    fonts: [
      { src: src("source-sans-3-latin-400-normal.woff"), fontWeight: 400 },
      { src: src("source-sans-3-latin-400-italic.woff"), fontWeight: 400, fontStyle: "italic" },
      { src: src("source-sans-3-latin-600-normal.woff"), fontWeight: 600 },
      { src: src("source-sans-3-latin-700-normal.woff"), fontWeight: 700 },
    ],
  });
  Font.register({
    family: DISPLAY,
    fonts: [
      { src: src("fraunces-latin-600-normal.woff"), fontWeight: 600 },
      { src: src("fraunces-latin-700-normal.woff"), fontWeight: 700 },
    ],
  });
  // Words stay whole: hyphenating "dense-pack" or "CFM50" mid-word reads badly in a report.
  Font.registerHyphenationCallback((word) => [word]);
}
