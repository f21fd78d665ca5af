import { useId, useState, type ReactNode } from "react";
import { Button } from "./button.tsx";

export type SignalWord = "danger" | "warning" | "caution" | "notice";

type SafetyPanelProps = { title?: string; children: ReactNode } & (
  | { signal: "danger" | "warning"; onAcknowledge: () => void; acknowledged?: boolean }
  | { signal: "caution" | "notice" }
);

const bands: Record<SignalWord, { word: string; band: string; mark: string }> = {
  danger: { word: "DANGER", band: "bg-safety-red text-safety-light", mark: "fill-safety-red" },
  warning: { word: "WARNING", band: "bg-safety-orange text-safety-dark", mark: "fill-safety-orange" },
  caution: { word: "CAUTION", band: "bg-safety-yellow text-safety-dark", mark: "fill-safety-yellow" },
  notice: { word: "NOTICE", band: "bg-safety-blue text-safety-light italic", mark: "" },
};

/**
 * ANSI Z535.4 style message: signal-word band, then what to do; DANGER and WARNING must be acknowledged.
 * Once acknowledged the text folds away under its band (it can be opened again), so the step's own
 * action is not pushed off the screen by panels the tech has already read.
 */
export function SafetyPanel(props: SafetyPanelProps) {
  const { signal, title, children } = props;
  const wordId = useId();
  const textId = useId();
  const { word, band, mark } = bands[signal];
  const needsAck = props.signal === "danger" || props.signal === "warning";
  const [pressed, setPressed] = useState(false);
  const [reopened, setReopened] = useState(false);
  const done = needsAck && (pressed || props.acknowledged === true);
  const folded = done && !reopened;

  return (
    <section aria-labelledby={wordId} className="overflow-hidden rounded-md border-2 border-ink bg-raised">
      <div className={`flex items-center gap-3 px-5 py-2 ${band}`}>
        {signal !== "notice" && <SafetyAlertSymbol exclamationClass={mark} />}
        <span id={wordId} className="text-2xl font-bold tracking-widest">
          {word}
        </span>
      </div>
      <div className="flex max-w-[70ch] flex-col gap-3 px-5 py-3">
        <div id={textId} hidden={folded} className="flex flex-col gap-3 pt-1">
          {title && <p className="text-xl font-semibold">{title}</p>}
          <div className="text-base">{children}</div>
        </div>
        {needsAck && !done && (
          <Button
            variant="primary"
            size="main"
            className="self-start"
            onClick={() => {
              setPressed(true);
              props.onAcknowledge();
            }}
          >
            Read and understood
          </Button>
        )}
        {done && (
          <div className="flex flex-wrap items-center justify-between gap-x-4 gap-y-2">
            <p role="status" className="flex items-center gap-3 font-semibold">
              <svg viewBox="0 0 24 24" className="size-7 shrink-0" aria-hidden="true" focusable="false">
                <circle cx="12" cy="12" r="11" className="fill-accent" />
                <path d="M7 12.5l3.2 3.2L17 9" fill="none" strokeWidth="2.6" className="stroke-accent-ink" />
              </svg>
              You have read this and will work with care.
            </p>
            <Button aria-expanded={!folded} aria-controls={textId} onClick={() => setReopened(!reopened)}>
              {folded ? "Show the text" : "Fold the text away"}
            </Button>
          </div>
        )}
      </div>
    </section>
  );
}

/**
 * The same panel to be read rather than worked through, as in a printed report: nothing to
 * acknowledge, and the band keeps its colour on paper (the word and the symbol carry it without).
 */
export function PrintedSafetyPanel({ signal, title, children }: { signal: SignalWord; title?: string; children: ReactNode }) {
  const wordId = useId();
  const { word, band, mark } = bands[signal];
  return (
    <section aria-labelledby={wordId} className="break-inside-avoid overflow-hidden rounded-md border-2 border-ink bg-raised">
      <div className={`flex items-center gap-3 px-5 py-2 [print-color-adjust:exact] ${band}`}>
        {signal !== "notice" && <SafetyAlertSymbol exclamationClass={mark} />}
        <span id={wordId} className="text-2xl font-bold tracking-widest">
          {word}
        </span>
      </div>
      <div className="flex max-w-[70ch] flex-col gap-2 px-5 py-3">
        {title && <p className="text-xl font-semibold">{title}</p>}
        <div className="text-base">{children}</div>
      </div>
    </section>
  );
}

/** Equilateral triangle with an exclamation mark, in the band's text colour. */
function SafetyAlertSymbol({ exclamationClass }: { exclamationClass: string }) {
  return (
    <svg viewBox="0 0 28 25" className="h-8 w-9 shrink-0" role="img" aria-label="Safety alert symbol" focusable="false">
      <path d="M14 1.5L26.8 23.5H1.2z" fill="currentColor" stroke="currentColor" strokeWidth="1.5" strokeLinejoin="round" />
      <rect x="12.4" y="8" width="3.2" height="9" rx="0.6" className={exclamationClass} />
      <circle cx="14" cy="20" r="1.8" className={exclamationClass} />
    </svg>
  );
}
