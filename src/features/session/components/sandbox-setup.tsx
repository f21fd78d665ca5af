import { useId, useState } from "react";
import { MAX_ALTITUDE_M, MIN_ALTITUDE_M } from "../../../../shared/calc/atmosphere.ts";
import { flowInputSchema, type FlowInput } from "../../../../shared/flow/step-rules.ts";
import { Button } from "../../../components/ui/button.tsx";
import { ChoiceGroup } from "../../../components/ui/choice-group.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";

const cycles = [
  { value: 2, label: "2-stroke" },
  { value: 4, label: "4-stroke" },
] as const;
const releases = [
  { value: "yes", label: "Compression release fitted" },
  { value: "no", label: "No compression release" },
  { value: "unknown", label: "Not known" },
] as const;

type Errors = Partial<Record<"displacementCc" | "altitudeM", string>>;

const numberOrNull = (text: string) => (text.trim() === "" ? null : Number(text));

/** The engine and the shop's altitude the trial run pretends to have: readings are judged by them. */
export function SandboxSetup({ defaultAltitudeM, onStart }: { defaultAltitudeM: number; onStart: (input: FlowInput) => void }) {
  const id = useId();
  const [cycle, setCycle] = useState<2 | 4>(2);
  const [release, setRelease] = useState<FlowInput["profile"]["compressionRelease"]>("no");
  const [cc, setCc] = useState("");
  const [altitude, setAltitude] = useState(String(defaultAltitudeM));
  const [errors, setErrors] = useState<Errors>({});

  const start = () => {
    const altitudeM = numberOrNull(altitude);
    const parsed = flowInputSchema.safeParse({ profile: { cycle, compressionRelease: release, displacementCc: numberOrNull(cc), specPsi: null }, altitudeM: altitudeM ?? Number.NaN });
    if (!parsed.success) {
      const next: Errors = {};
      for (const issue of parsed.error.issues) {
        if (issue.path.includes("displacementCc")) next.displacementCc = "Enter the displacement in cc as a number above zero, or leave it empty.";
        if (issue.path.includes("altitudeM")) next.altitudeM = `Enter the altitude in metres, from ${MIN_ALTITUDE_M} to ${MAX_ALTITUDE_M}.`;
      }
      return setErrors(next);
    }
    setErrors({});
    onStart(parsed.data as FlowInput);
  };

  return (
    <form
      className="flex max-w-3xl flex-col gap-6"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        start();
      }}
    >
      <ChoiceGroup id={`${id}-cycle`} name="cycle" legend="Engine" choices={cycles} value={cycle} onChange={setCycle} minChoiceWidth="fit" />
      <ChoiceGroup id={`${id}-release`} name="release" legend="Compression release" choices={releases} value={release} onChange={setRelease} />
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField id={`${id}-cc`} label="Displacement (cc)" inputMode="decimal" value={cc} onChange={(e) => setCc(e.target.value)} error={errors.displacementCc} hint="Leave empty if not known." />
        <TextField id={`${id}-alt`} label="Shop altitude (m)" inputMode="decimal" value={altitude} onChange={(e) => setAltitude(e.target.value)} error={errors.altitudeM} />
      </div>
      <Button type="submit" variant="primary" size="main" className="self-start">
        Start the trial run
      </Button>
    </form>
  );
}
