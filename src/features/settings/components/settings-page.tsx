import { useQuery } from "@tanstack/react-query";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { settingsQueryOptions } from "../api/get-settings.ts";
import { SettingsForm } from "./settings-form.tsx";

export function SettingsPage() {
  const settings = useQuery(settingsQueryOptions());
  if (settings.isError) return <FormProblem title="The shop settings did not load.">Check that this tablet is on the shop's network, then reload.</FormProblem>;
  if (!settings.data) return <p className="text-ink-muted">Loading the shop settings…</p>;
  return <SettingsForm saved={settings.data} />;
}
