// Fonts for the PDFs: the WOFF files shipped in fonts/ (WOFF2 does not load in React-PDF), by
// absolute path so the renderer finds them from any working directory the server starts in.
import path from "node:path";
import { Font } from "@react-pdf/renderer";

export const BODY = "Source Sans 3";
export const DISPLAY = "Fraunces";

let registered = false;

/** Registers the body and display faces once per process. */
export function registerFonts() {
  if (registered) return;
  registered = true;
  const file = (name: string) => path.join(process.cwd(), "fonts", name);
  Font.register({
    family: BODY,
    fonts: [
      { src: file("source-sans-3-latin-400-normal.woff"), fontWeight: 400 },
      { src: file("source-sans-3-latin-400-italic.woff"), fontWeight: 400, fontStyle: "italic" },
      { src: file("source-sans-3-latin-600-normal.woff"), fontWeight: 600 },
      { src: file("source-sans-3-latin-700-normal.woff"), fontWeight: 700 },
    ],
  });
  Font.register({
    family: DISPLAY,
    fonts: [
      { src: file("fraunces-latin-600-normal.woff"), fontWeight: 600 },
      { src: file("fraunces-latin-700-normal.woff"), fontWeight: 700 },
    ],
  });
  // Words stay whole: hyphenating "dense-pack" or "CFM50" mid-word reads badly in a report.
  Font.registerHyphenationCallback((word) => [word]);
}
