// The customer report as a PDF: A4 or Letter, black on white, page numbers on every page.
import { and, eq } from "drizzle-orm";
import { Document, Page, Text, View, renderToBuffer } from "@react-pdf/renderer";
import type { AppContext } from "../context.ts";
import { estimates, workOrders } from "../db/schema.ts";
import { notFound } from "../lib/errors.ts";
import { customerReport, type ReportSending } from "../services/customer-report.ts";
import { Estimate, Fact, Finding, SafetyPanel } from "./report-sections.tsx";
import { registerFonts, s } from "./report-styles.ts";
import { reportFileName } from "../../shared/report/customer-report.ts";
import { formatDay } from "../../shared/report/dates.ts";
import { shopContact, unitFacts, unitTitle } from "../../shared/report/words.ts";
import type { CustomerReport, PaperSize } from "../../shared/schemas/report.ts";

/** The report as a react-pdf document. */
export function CustomerReportDocument({ report, paper }: { report: CustomerReport; paper: PaperSize }) {
  const { shop, workOrder, unit } = report;
  return (
    <Document title={`${shop.name} · Customer report · ${workOrder.label}`} author={shop.name} subject={`Customer report for ${workOrder.label}`} creator="Benchpath" producer="Benchpath">
      <Page size={paper === "letter" ? "LETTER" : "A4"} style={s.page}>
        <View style={s.running} fixed render={({ pageNumber }) => (pageNumber > 1 ? <Text>{`${shop.name} · Customer report · ${workOrder.label}`}</Text> : null)} />
        <View style={s.footerRule} fixed />
        <Text style={s.footerLeft} fixed>
          {shop.name} · {workOrder.label}
        </Text>
        <Text style={s.footerRight} fixed render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
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

/** The report of an estimate, ready to attach to the e-mail that sends it (shown as sent, when `sending` is given). */
export async function customerReportAttachment(
  ctx: Pick<AppContext, "db">,
  estimate: { id: string; workOrderId: string },
  paper: PaperSize = "a4",
  sending?: ReportSending,
): Promise<{ filename: string; content: Buffer; contentType: "application/pdf" }> {
  const [row] = await ctx.db
    .select({ number: workOrders.number, revision: estimates.revision })
    .from(estimates)
    .innerJoin(workOrders, eq(workOrders.id, estimates.workOrderId))
    .where(and(eq(estimates.id, estimate.id), eq(estimates.workOrderId, estimate.workOrderId)));
  if (!row) throw notFound("This work order has no such estimate.");
  const content = await renderReportPdf(await customerReport(ctx, estimate.workOrderId, estimate.id, new Date(), sending), paper);
  return { filename: reportFileName(row.number, row.revision), content, contentType: "application/pdf" };
}
