import { LaterReleasePanel } from "../../components/ui/later-release-panel.tsx";
import { areas } from "../areas.ts";

export function Component() {
  const { label, summary } = areas["bench"];
  return <LaterReleasePanel title={label} summary={summary} />;
}
