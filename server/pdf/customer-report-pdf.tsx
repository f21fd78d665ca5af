// The customer report as a PDF: A4 or Letter, black on white, page numbers on every page.
import { createRequire } from "node:module";
import { Circle, Document, Font, Page, Path, Rect, StyleSheet, Svg, Text, View, renderToBuffer } from "@react-pdf/renderer";
import type { AppContext } from "../context.ts";
import { customerReport } from "../services/customer-report.ts";
import { formatDay } from "../../shared/report/dates.ts";
import { formatMoney } from "../../shared/report/money.ts";
import { reportFileName } from "../../shared/report/customer-report.ts";
import { lineQuantity, optionTotalRows, readingText, shopContact, unitFacts, unitTitle } from "../../shared/report/words.ts";
import type { CustomerReport, PaperSize, ReportEstimate, ReportFinding, ReportSafetyNote } from "../../shared/schemas/report.ts";
import { estimates, workOrders } from "../db/schema.ts";
import { and, eq } from "drizzle-orm";
import { notFound } from "../lib/errors.ts";

// IBM Plex Sans from the app's own font package (WOFF; react-pdf reads TTF and WOFF, not WOFF2). The
// Latin files hold the report's text; the Latin Extended and Greek ones are fallbacks for names with
// other letters and for Ω in resistance readings.
const FAMILY = "IBM Plex Sans";
const fallbacks = { "latin-ext": `${FAMILY} Latin Extended`, greek: `${FAMILY} Greek` } as const;
const FONT_STACK = [FAMILY, fallbacks["latin-ext"], fallbacks.greek];
let fontsRegistered = false;

function registerFonts() {
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

const s = StyleSheet.create({
  page: { fontFamily: FONT_STACK, fontSize: 10, lineHeight: 1.4, color: INK, paddingTop: 54, paddingBottom: 58, paddingHorizontal: 48 },
  running: { position: "absolute", top: 24, left: 48, right: 48, flexDirection: "row", justifyContent: "space-between", fontSize: 8, color: MUTED },
  footer: { position: "absolute", bottom: 24, left: 48, right: 48, flexDirection: "row", justifyContent: "space-between", fontSize: 8, color: MUTED, borderTopWidth: 0.75, borderTopColor: RULE, paddingTop: 5 },
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
  panelWord: { fontSize: 13, fontWeight: 700, letterSpacing: 2, marginLeft: 6 },
  panelBody: { paddingHorizontal: 8, paddingVertical: 6 },
});

// ANSI Z535.4 signal-word bands; each reads in black and white by its word and symbol alone.
const bands: Record<ReportSafetyNote["signal"], { fill: string; ink: string; symbol: boolean; italic?: boolean }> = {
  DANGER: { fill: "#c8102e", ink: "#ffffff", symbol: true },
  WARNING: { fill: "#ff8200", ink: "#000000", symbol: true },
  CAUTION: { fill: "#ffd100", ink: "#000000", symbol: true },
  NOTICE: { fill: "#0072ce", ink: "#ffffff", symbol: false, italic: true },
};

function SafetyAlertSymbol({ ink, fill }: { ink: string; fill: string }) {
  return (
    <Svg viewBox="0 0 28 25" style={{ width: 18, height: 16 }}>
      <Path d="M14 1.5L26.8 23.5H1.2z" fill={ink} stroke={ink} strokeWidth={1.5} strokeLinejoin="round" />
      <Rect x={12.4} y={8} width={3.2} height={9} rx={0.6} fill={fill} />
      <Circle cx={14} cy={20} r={1.8} fill={fill} />
    </Svg>
  );
}

function SafetyPanel({ note }: { note: ReportSafetyNote }) {
  const band = bands[note.signal];
  return (
    <View style={s.panel} wrap={false}>
      <View style={[s.panelBand, { backgroundColor: band.fill }]}>
        {band.symbol && <SafetyAlertSymbol ink={band.ink} fill={band.fill} />}
        <Text style={[s.panelWord, { color: band.ink }, band.italic ? { fontStyle: "italic" } : {}]}>{note.signal}</Text>
      </View>
      <View style={s.panelBody}>
        <Text style={{ fontWeight: 600, marginBottom: 2 }}>{note.title}</Text>
        <Text>{note.text}</Text>
      </View>
    </View>
  );
}

function Finding({ finding }: { finding: ReportFinding }) {
  return (
    <View style={s.box}>
      <Text style={s.small}>
        {finding.certaintyLabel} · {finding.flowTitle}
        {finding.completedAt ? ` · ${formatDay(finding.completedAt)}` : ""}
      </Text>
      <Text style={s.h3}>{finding.title}</Text>
      <Text style={s.paragraph}>{finding.explanation}</Text>
      {finding.readings.length > 0 && (
        <View style={{ marginTop: 4 }}>
          <View style={s.headRow}>
            <Text style={s.cellStep}>Measured</Text>
            <Text style={s.cellFigure}>Reading</Text>
            <Text style={s.cellVerdict}>Verdict</Text>
          </View>
          {finding.readings.map((r) => (
            <View key={r.stepId} style={s.row} wrap={false}>
              <Text style={s.cellStep}>{r.title}</Text>
              <Text style={s.cellFigure}>{readingText(r)}</Text>
              <Text style={s.cellVerdict}>{r.band ? `${r.verdictLabel}: ${r.band}` : r.verdictLabel}</Text>
            </View>
          ))}
        </View>
      )}
      {finding.repairs.length > 0 && (
        <View style={{ marginTop: 6 }}>
          <Text style={{ fontWeight: 600 }}>Recommended repairs</Text>
          {finding.repairs.map((r) => (
            <Text key={r.title}>
              • {r.title}
              {r.parts.length > 0 ? ` (${r.parts.join(", ")})` : ""}
            </Text>
          ))}
        </View>
      )}
    </View>
  );
}

function Estimate({ estimate }: { estimate: ReportEstimate }) {
  const money = (cents: number) => formatMoney(cents, estimate.currency);
  return (
    <View break>
      <Text style={s.h2} minPresenceAhead={80}>
        Estimate, revision {estimate.revision}
      </Text>
      <View style={s.facts}>
        <Fact label="Status" value={estimate.statusLabel} />
        {estimate.validUntil && <Fact label="Valid until" value={formatDay(estimate.validUntil)} />}
        {estimate.sentAt && <Fact label="Sent" value={formatDay(estimate.sentAt)} />}
        {estimate.decidedAt && <Fact label="Answered" value={formatDay(estimate.decidedAt)} />}
      </View>
      <Text style={[s.paragraph, { fontWeight: 600, marginTop: 4 }]}>{estimate.decisionText}</Text>
      {estimate.note.trim() !== "" && <Text style={s.paragraph}>{estimate.note}</Text>}
      {estimate.options.map((option) => (
        <View key={option.id} style={option.approved ? s.boxStrong : s.box} wrap={false}>
          {option.approved && <Text style={s.tag}>APPROVED</Text>}
          <Text style={s.h3}>
            Option {option.position}: {option.title}
          </Text>
          <View style={s.headRow}>
            <Text style={s.cellDesc}>Item</Text>
            <Text style={s.cellQty}>Qty</Text>
            <Text style={s.cellMoney}>Unit price</Text>
            <Text style={s.cellMoney}>Amount</Text>
          </View>
          {option.lines.map((line, i) => (
            <View key={`${line.kind}-${i}`} style={s.row}>
              <Text style={s.cellDesc}>{line.description}</Text>
              <Text style={s.cellQty}>{lineQuantity(line)}</Text>
              <Text style={s.cellMoney}>{money(line.unitPriceCents)}</Text>
              <Text style={s.cellMoney}>{money(line.amountCents)}</Text>
            </View>
          ))}
          <View style={s.totals}>
            {optionTotalRows(option, estimate).map(([label, amount]) => (
              <View key={label} style={s.totalRow}>
                <Text>{label}</Text>
                <Text>{amount}</Text>
              </View>
            ))}
            <View style={s.grandTotal}>
              <Text>Total</Text>
              <Text>{money(option.totalCents)}</Text>
            </View>
          </View>
        </View>
      ))}
      <Text style={s.small}>
        Labour at {money(estimate.labourRateCents)} an hour. Tax is worked out once on the taxable subtotal{estimate.taxLabour ? " (parts, labour and fees)" : " (parts only)"}.
      </Text>
    </View>
  );
}

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <View style={s.fact}>
      <Text style={s.factLabel}>{label}</Text>
      <Text style={s.factValue}>{value}</Text>
    </View>
  );
}

/** The report as a react-pdf document. */
export function CustomerReportDocument({ report, paper }: { report: CustomerReport; paper: PaperSize }) {
  const { shop, workOrder, unit } = report;
  return (
    <Document title={`${shop.name} · Customer report · ${workOrder.label}`} author={shop.name} subject={`Customer report for ${workOrder.label}`} creator="Benchpath" producer="Benchpath">
      <Page size={paper === "letter" ? "LETTER" : "A4"} style={s.page}>
        <View style={s.running} fixed render={({ pageNumber }) => (pageNumber > 1 ? <Text>{`${shop.name} · Customer report · ${workOrder.label}`}</Text> : null)} />
        <View style={s.masthead}>
          <View style={{ flex: 1, paddingRight: 12 }}>
            <Text style={s.shopName}>{shop.name}</Text>
            {shopContact(shop).map((line) => (
              <Text key={line} style={s.small}>
                {line}
              </Text>
            ))}
          </View>
          <View>
            <Text style={s.docTitle}>Customer report</Text>
            <Text style={s.number}>{workOrder.label}</Text>
            <Text style={[s.small, s.right]}>Received {formatDay(workOrder.receivedAt)}</Text>
            <Text style={[s.small, s.right]}>Printed {formatDay(report.generatedAt)}</Text>
          </View>
        </View>

        <View style={s.facts}>
          <Fact label="Customer" value={report.customer.name} />
          <Fact label="Status" value={workOrder.stateLabel} />
        </View>

        <Text style={s.h2}>The unit: {unitTitle(unit)}</Text>
        <View style={s.facts}>
          {unitFacts(unit).map(([label, value]) => (
            <Fact key={label} label={label} value={value} />
          ))}
        </View>

        <Text style={s.h2}>What you told us</Text>
        <Text style={s.paragraph}>{report.complaint}</Text>

        <Text style={s.h2} minPresenceAhead={60}>
          What we found
        </Text>
        {report.findings.length === 0 ? (
          <Text style={s.paragraph}>The checks on this unit are not finished yet.</Text>
        ) : (
          report.findings.map((f) => <Finding key={f.sessionId} finding={f} />)
        )}

        {report.estimate && <Estimate estimate={report.estimate} />}

        <Text style={s.h2} minPresenceAhead={120}>
          Safety
        </Text>
        <Text style={s.paragraph}>{report.safety.intro}</Text>
        {report.safety.notes.map((note) => (
          <SafetyPanel key={note.title} note={note} />
        ))}

        <View wrap={false}>
          <Text style={s.h2}>Warranty</Text>
          {report.warranty.shopNote !== "" && <Text style={s.paragraph}>{report.warranty.shopNote}</Text>}
          <Text style={s.paragraph}>{report.warranty.standardLine}</Text>
        </View>

        <View style={s.footer} fixed>
          <Text>
            {shop.name} · {workOrder.label}
          </Text>
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        </View>
      </Page>
    </Document>
  );
}

/** Renders a report already gathered. */
export async function renderReportPdf(report: CustomerReport, paper: PaperSize = "a4"): Promise<Buffer> {
  registerFonts();
  return renderToBuffer(<CustomerReportDocument report={report} paper={paper} />);
}

/** The work order's customer report as a PDF (A4 unless told), with the estimate named or its latest one. */
export async function renderCustomerReportPdf(ctx: Pick<AppContext, "db">, workOrderId: string, estimateId?: string, paper: PaperSize = "a4"): Promise<Buffer> {
  return renderReportPdf(await customerReport(ctx, workOrderId, estimateId), paper);
}

/** The report of an estimate, ready to attach to the e-mail that sends it. */
export async function customerReportAttachment(
  ctx: Pick<AppContext, "db">,
  estimate: { id: string; workOrderId: string },
  paper: PaperSize = "a4",
): Promise<{ filename: string; content: Buffer; contentType: "application/pdf" }> {
  const [row] = await ctx.db
    .select({ number: workOrders.number, revision: estimates.revision })
    .from(estimates)
    .innerJoin(workOrders, eq(workOrders.id, estimates.workOrderId))
    .where(and(eq(estimates.id, estimate.id), eq(estimates.workOrderId, estimate.workOrderId)));
  if (!row) throw notFound("This work order has no such estimate.");
  const content = await renderCustomerReportPdf(ctx, estimate.workOrderId, estimate.id, paper);
  return { filename: reportFileName(row.number, row.revision), content, contentType: "application/pdf" };
}
