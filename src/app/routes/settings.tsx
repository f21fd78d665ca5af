import { SettingsPage } from "../../features/settings/components/settings-page.tsx";

export function Component() {
  return <SettingsPage />;
}
