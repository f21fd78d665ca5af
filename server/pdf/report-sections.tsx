// The parts of the customer report's PDF: facts, a finding with its readings, the estimate, a safety panel.
import { Circle, Path, Rect, Svg, Text, View } from "@react-pdf/renderer";
import { formatDay } from "../../shared/report/dates.ts";
import { formatMoney } from "../../shared/calc/money.ts";
import { lineQuantity, optionTotalRows, readingText } from "../../shared/report/words.ts";
import type { ReportEstimate, ReportFinding, ReportSafetyNote } from "../../shared/schemas/report.ts";
import { bands, s } from "./report-styles.ts";

function SafetyAlertSymbol({ ink, fill }: { ink: string; fill: string }) {
  return (
    <Svg viewBox="0 0 28 25" style={{ width: 18, height: 16 }}>
      <Path d="M14 1.5L26.8 23.5H1.2z" fill={ink} stroke={ink} strokeWidth={1.5} strokeLinejoin="round" />
      <Rect x={12.4} y={8} width={3.2} height={9} rx={0.6} fill={fill} />
      <Circle cx={14} cy={20} r={1.8} fill={fill} />
    </Svg>
  );
}

export function SafetyPanel({ note }: { note: ReportSafetyNote }) {
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

export function Finding({ finding }: { finding: ReportFinding }) {
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

export function Estimate({ estimate }: { estimate: ReportEstimate }) {
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
        // A short option stays on one page; a long one runs on, its lines whole.
        <View key={option.id} style={option.approved ? s.boxStrong : s.box} wrap={option.lines.length > 16}>
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
            <View key={`${line.kind}-${i}`} style={s.row} wrap={false}>
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

export function Fact({ label, value }: { label: string; value: string }) {
  return (
    <View style={s.fact}>
      <Text style={s.factLabel}>{label}</Text>
      <Text style={s.factValue}>{value}</Text>
    </View>
  );
}
