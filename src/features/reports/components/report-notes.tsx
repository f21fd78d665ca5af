import type { CustomerReport } from "../../../../shared/schemas/report.ts";
import { PrintedSafetyPanel, type SignalWord } from "../../../components/ui/safety-panel.tsx";

/** The safety notes, in ANSI Z535 panels, and the warranty terms. */
export function ReportNotes({ safety, warranty }: Pick<CustomerReport, "safety" | "warranty">) {
  return (
    <>
      <section aria-labelledby="report-safety" className="flex flex-col gap-4">
        <h2 id="report-safety" className="border-b-2 border-ink pb-1 text-2xl font-semibold">Safety</h2>
        <p>{safety.intro}</p>
        {safety.notes.map((note) => (
          <PrintedSafetyPanel key={note.title} signal={note.signal.toLowerCase() as SignalWord} title={note.title}>
            {note.text}
          </PrintedSafetyPanel>
        ))}
      </section>
      <section aria-labelledby="report-warranty" data-print="keep" className="flex flex-col gap-2">
        <h2 id="report-warranty" className="border-b-2 border-ink pb-1 text-2xl font-semibold">Warranty</h2>
        {warranty.shopNote !== "" && <p>{warranty.shopNote}</p>}
        <p>{warranty.standardLine}</p>
      </section>
    </>
  );
}
