import type { RawStep } from "../lib/draft-edits.ts";
import type { StepChoice } from "./target-field.tsx";

interface SectionStepViewProps {
  step: RawStep;
  /** The draft's embedded sections, for the section's title. */
  sections: unknown;
  choices: readonly StepChoice[];
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/** A step that runs a section is shown, not edited: the section lives in the shop's library. */
export function SectionStepView({ step, sections, choices }: SectionStepViewProps) {
  const sectionId = typeof step.section === "string" ? step.section : "";
  const section = isRecord(sections) ? sections[sectionId] : undefined;
  const sectionTitle = isRecord(section) && typeof section.title === "string" ? section.title : null;
  const next = typeof step.next === "string" ? step.next : "";
  const nextTitle = choices.find((choice) => choice.id === next)?.title;
  return (
    <div className="flex flex-col gap-4">
      <p className="max-w-[65ch] text-ink-muted">This step runs a section from the shop's library. Sections are edited on their own, so here it can only be read, renamed or deleted.</p>
      <dl className="grid gap-x-6 gap-y-3 landscape:grid-cols-[12rem_1fr]">
        <dt className="font-semibold">Title</dt>
        <dd>{typeof step.title === "string" ? step.title : ""}</dd>
        <dt className="font-semibold">Section</dt>
        <dd>
          {sectionTitle ? `${sectionTitle} ` : ""}
          <span className="text-ink-muted">({sectionId === "" ? "none named" : sectionId})</span>
        </dd>
        <dt className="font-semibold">Then goes to</dt>
        <dd>
          {nextTitle ? `${nextTitle} ` : ""}
          <span className="text-ink-muted">({next === "" ? "nowhere yet" : next})</span>
        </dd>
      </dl>
    </div>
  );
}
