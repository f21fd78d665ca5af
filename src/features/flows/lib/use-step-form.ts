// What every step form shares: zod through react-hook-form, errors shown at once, and each change
// handed to the draft as it is typed.
import { useEffect, useEffectEvent } from "react";
import type { FieldValues, UseFormReturn } from "react-hook-form";
import { cleanStep, type RawStep } from "./draft-edits.ts";

export type StepChange = (step: RawStep, field: string) => void;

/** An input's id from its field's path: `options.0.next` → `field-options-0-next`. */
export const fieldId = (name: string) => `field-${name.replace(/\./g, "-")}`;

export function useStepFormSync<T extends FieldValues, O>(form: UseFormReturn<T, unknown, O>, onChange: StepChange) {
  // Only a change to a field counts: validating on its own (a remount, a trigger) edits nothing.
  const commit = useEffectEvent((values: T, name: string | undefined) => {
    if (name !== undefined) onChange(cleanStep(values), name);
  });
  const { subscribe, trigger } = form;
  useEffect(() => subscribe({ formState: { values: true }, callback: ({ values, name }) => commit(values, name) }), [subscribe]);
  // A step loaded with problems shows them beside its fields straight away.
  useEffect(() => {
    void trigger();
  }, [trigger]);
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/** A stored step as form values: lists that must be lists are, whatever an imported file held. */
export function formValuesOf<T>(step: RawStep, lists: readonly string[]): T {
  const values: Record<string, unknown> = { ...step };
  for (const key of lists) if (key in values && !Array.isArray(values[key])) values[key] = [];
  if ("photo" in values && !isRecord(values.photo)) delete values.photo;
  return values as T;
}
