// The customer report's PDF look: IBM Plex Sans, black on white, the Z535 signal-word bands.
import { createRequire } from "node:module";
import { Font, StyleSheet } from "@react-pdf/renderer";
import type { ReportSafetyNote } from "../../shared/schemas/report.ts";

// IBM Plex Sans from the app's own font package (WOFF; react-pdf reads TTF and WOFF, not WOFF2). The
// Latin files hold the report's text; the Latin Extended and Greek ones are fallbacks for names with
// other letters and for Ω in resistance readings.
export const FAMILY = "IBM Plex Sans";
const fallbacks = { "latin-ext": `${FAMILY} Latin Extended`, greek: `${FAMILY} Greek` } as const;
const FONT_STACK = [FAMILY, fallbacks["latin-ext"], fallbacks.greek];
let fontsRegistered = false;

export function registerFonts() {
  if (fontsRegistered) return;
  const require = createRequire(import.meta.url);
  const file = (subset: string, weight: number) => require.resolve(`@fontsource/ibm-plex-sans/files/ibm-plex-sans-${subset}-${weight}-normal.woff`);
  const family = (name: string, subset: string) =>
    Font.register({ family: name, fonts: [400, 600, 700].map((fontWeight) => ({ src: file(subset, fontWeight), fontWeight })) });
  family(FAMILY, "latin");
  family(fallbacks["latin-ext"], "latin-ext");
  family(fallbacks.greek, "greek");
  // Words stay whole: a part number or a reading split over two lines misleads.
  Font.registerHyphenationCallback((word) => [word]);
  fontsRegistered = true;
}

const INK = "#000000";
const MUTED = "#3d3d3d";
const RULE = "#6b6b6b";

export const s = StyleSheet.create({
  // No lineHeight anywhere: this react-pdf resolves it against the wrong size (lines overlap or spread
  // apart, and the page numbers drawn by render vanish), so the font's own spacing is used.
  page: { fontFamily: FONT_STACK, fontSize: 10, color: INK, paddingTop: 54, paddingBottom: 58, paddingHorizontal: 48 },
  running: { position: "absolute", top: 24, left: 48, right: 48, flexDirection: "row", justifyContent: "space-between", fontSize: 8, color: MUTED },
  footerRule: { position: "absolute", bottom: 40, left: 48, right: 48, borderTopWidth: 0.75, borderTopColor: RULE },
  footerLeft: { position: "absolute", bottom: 26, left: 48, fontSize: 8, color: MUTED },
  // Text drawn by render gets no width from one edge alone: both are given.
  footerRight: { position: "absolute", bottom: 26, left: 300, right: 48, textAlign: "right", fontSize: 8, color: MUTED },
  masthead: { flexDirection: "row", justifyContent: "space-between", borderBottomWidth: 2, borderBottomColor: INK, paddingBottom: 10, marginBottom: 14 },
  shopName: { fontSize: 17, fontWeight: 700 },
  small: { fontSize: 9, color: MUTED },
  docTitle: { fontSize: 14, fontWeight: 600, textAlign: "right" },
  number: { fontSize: 17, fontWeight: 700, textAlign: "right" },
  right: { textAlign: "right" },
  h2: { fontSize: 13, fontWeight: 700, marginTop: 14, marginBottom: 6, paddingBottom: 3, borderBottomWidth: 1, borderBottomColor: INK },
  h3: { fontSize: 11, fontWeight: 600, marginTop: 6, marginBottom: 3 },
  facts: { flexDirection: "row", flexWrap: "wrap" },
  fact: { width: "50%", flexDirection: "row", paddingVertical: 1.5 },
  factLabel: { width: 86, color: MUTED },
  factValue: { flex: 1, fontWeight: 600 },
  paragraph: { marginBottom: 4 },
  box: { borderWidth: 1, borderColor: RULE, padding: 8, marginBottom: 8 },
  boxStrong: { borderWidth: 2.5, borderColor: INK, padding: 8, marginBottom: 8 },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 2.5 },
  headRow: { flexDirection: "row", borderBottomWidth: 1, borderBottomColor: INK, paddingVertical: 2.5, fontWeight: 600 },
  cellStep: { flex: 3, paddingRight: 6 },
  cellFigure: { flex: 2, paddingRight: 6, fontWeight: 600 },
  cellVerdict: { flex: 1.3 },
  cellDesc: { flex: 4, paddingRight: 6 },
  cellQty: { width: 48, textAlign: "right", paddingRight: 6 },
  cellMoney: { width: 74, textAlign: "right" },
  totals: { marginTop: 4, marginLeft: "45%" },
  totalRow: { flexDirection: "row", justifyContent: "space-between", paddingVertical: 1.5 },
  grandTotal: { flexDirection: "row", justifyContent: "space-between", borderTopWidth: 1.5, borderTopColor: INK, marginTop: 2, paddingTop: 3, fontSize: 12, fontWeight: 700 },
  tag: { fontSize: 9, fontWeight: 700, borderWidth: 1.5, borderColor: INK, paddingHorizontal: 5, paddingVertical: 1, alignSelf: "flex-start", marginBottom: 4 },
  panel: { borderWidth: 2, borderColor: INK, marginBottom: 8 },
  panelBand: { flexDirection: "row", alignItems: "center", paddingHorizontal: 8, paddingVertical: 4 },
  panelWord: { fontSize: 13, fontWeight: 700, marginLeft: 6 },
  panelBody: { paddingHorizontal: 8, paddingVertical: 6 },
});

// ANSI Z535.4 signal-word bands; each reads in black and white by its word and symbol alone.
export const bands: Record<ReportSafetyNote["signal"], { fill: string; ink: string; symbol: boolean; italic?: boolean }> = {
  DANGER: { fill: "#c8102e", ink: "#ffffff", symbol: true },
  WARNING: { fill: "#ff8200", ink: "#000000", symbol: true },
  CAUTION: { fill: "#ffd100", ink: "#000000", symbol: true },
  NOTICE: { fill: "#0072ce", ink: "#ffffff", symbol: false, italic: true },
};
