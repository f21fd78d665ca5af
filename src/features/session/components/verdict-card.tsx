import { m } from "framer-motion";
import { unitLabel } from "../../../../shared/calc/units.ts";
import type { CompiledStep } from "../../../../shared/flow/compile.ts";
import type { ReadingRecord } from "../../../../shared/flow/context.ts";
import { Button } from "../../../components/ui/button.tsx";
import { VerdictMark } from "../../../components/ui/verdict-mark.tsx";

const fmt = (n: number) => String(Number(n.toPrecision(4)));

// Why the same gauge reads differently at the shop's height and on a decompression engine.
function CompressionNotes({ reading, altitudeM }: { reading: ReadingRecord; altitudeM: number }) {
  if (!reading.compression) return null;
  const { seaLevelPsi, ruleId } = reading.compression;
  const release = ruleId.startsWith("four_stroke_release");
  return (
    <div className="flex flex-col gap-2 text-base">
      <p className="tabular-figures">
        At sea level this would read about {fmt(seaLevelPsi)} psi; the shop is at {Math.round(altitudeM)} m, where thinner air fills the cylinder less.
      </p>
      {release && (
        <p>
          This 4-stroke has a compression release: it holds a valve open a little while cranking so the engine is easy to pull, so the gauge reads
          lower than the engine makes when running.
        </p>
      )}
    </div>
  );
}

/** The reading just recorded and what it means, settling into place before the tech goes on. */
export function VerdictCard({ step, reading, altitudeM, onContinue }: { step: CompiledStep; reading: ReadingRecord; altitudeM: number; onContinue: () => void }) {
  return (
    <m.section
      aria-label="Reading recorded"
      initial={{ opacity: 0, scale: 0.97 }}
      animate={{ opacity: 1, scale: 1 }}
      transition={{ duration: 0.2, ease: "easeOut" }}
      className="flex max-w-[70ch] flex-col gap-4 rounded-xl border-2 border-line-strong bg-raised px-6 py-5"
    >
      <p className="text-base text-ink-muted">{step.title}</p>
      <p className="tabular-figures text-4xl font-semibold">
        {fmt(reading.value)} {unitLabel(reading.unit)}
      </p>
      <VerdictMark verdict={reading.verdict} />
      <p className="text-lg">{reading.reason}</p>
      <CompressionNotes reading={reading} altitudeM={altitudeM} />
      <Button variant="primary" size="main" className="self-start" onClick={onContinue}>
        Go on to the next step
      </Button>
    </m.section>
  );
}
