import type { Ref } from "react";
import { describedBy, FieldError, NeededTag } from "./field-error.tsx";

export interface Choice<T extends string | number> {
  value: T;
  label: string;
}

interface ChoiceGroupProps<T extends string | number> {
  id: string;
  name: string;
  legend: string;
  hint?: string;
  needed?: boolean;
  choices: readonly Choice<T>[];
  value: T | null | undefined;
  onChange: (value: T) => void;
  onBlur?: () => void;
  error?: string;
  /** Narrowest a choice may get; "fit" keeps short choices in one row at their own width. */
  minChoiceWidth?: "fit" | "narrow" | "wide";
  ref?: Ref<HTMLInputElement>;
}

const layouts = {
  fit: "flex flex-wrap gap-3 [&>label]:min-w-32",
  narrow: "grid gap-3 grid-cols-[repeat(auto-fill,minmax(9.5rem,1fr))]",
  wide: "grid gap-3 grid-cols-[repeat(auto-fill,minmax(12rem,1fr))]",
};

/** One answer from a few, as big tiles a gloved thumb can hit; native radios underneath for keyboards and readers. */
export function ChoiceGroup<T extends string | number>(props: ChoiceGroupProps<T>) {
  const { id, name, legend, hint, needed, choices, value, onChange, onBlur, error, minChoiceWidth = "wide", ref } = props;
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  const columns = layouts[minChoiceWidth];
  return (
    <fieldset
      id={id}
      role="radiogroup"
      aria-required={needed ? true : undefined}
      aria-invalid={error ? true : undefined}
      aria-describedby={describedBy(error && errorId, hint && hintId)}
      className="flex min-w-0 flex-col gap-2"
    >
      <legend className="mb-2 text-base font-semibold">
        {legend}
        {needed && <NeededTag />}
      </legend>
      {hint && (
        <p id={hintId} className="-mt-1 text-base text-ink-muted">
          {hint}
        </p>
      )}
      <div className={columns}>
        {choices.map((choice, index) => {
          const checked = value === choice.value;
          return (
            <label
              key={String(choice.value)}
              className={
                "flex min-h-16 items-center gap-3 rounded-lg border-2 px-4 py-2 text-lg font-semibold select-none " +
                "has-focus-visible:outline-3 has-focus-visible:outline-offset-3 has-focus-visible:outline-focus " +
                (checked ? "border-accent bg-accent-soft" : error ? "border-problem bg-raised" : "border-line-strong bg-raised")
              }
            >
              <input
                ref={index === 0 ? ref : undefined}
                type="radio"
                name={name}
                value={String(choice.value)}
                checked={checked}
                onChange={() => onChange(choice.value)}
                onBlur={onBlur}
                className="sr-only"
              />
              <ChoiceMark checked={checked} />
              <span>{choice.label}</span>
            </label>
          );
        })}
      </div>
      {error && <FieldError id={errorId} message={error} />}
    </fieldset>
  );
}

// The chosen tile shows a tick in a filled ring, so the choice reads without colour.
function ChoiceMark({ checked }: { checked: boolean }) {
  return (
    <svg viewBox="0 0 24 24" className="size-7 shrink-0" aria-hidden="true" focusable="false">
      <circle cx="12" cy="12" r="10" strokeWidth="2.4" className={checked ? "fill-accent stroke-accent" : "fill-raised stroke-ink-muted"} />
      {checked && <path d="M7 12.5l3.2 3.2L17 9" fill="none" strokeWidth="2.8" strokeLinecap="round" strokeLinejoin="round" className="stroke-accent-ink" />}
    </svg>
  );
}
