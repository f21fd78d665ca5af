import { ProblemGlyph } from "../../../components/ui/problem-glyph.tsx";

/** Why the answers are not open yet, right above them. */
export function GateNote({ reasons }: { reasons: string[] }) {
  if (reasons.length === 0) return null;
  return (
    <div className="flex max-w-[70ch] flex-col gap-1">
      {reasons.map((reason) => (
        <p key={reason} className="flex items-start gap-2 text-base font-medium">
          <ProblemGlyph className="mt-0.5 size-6 shrink-0" />
          <span>{reason}</span>
        </p>
      ))}
    </div>
  );
}
