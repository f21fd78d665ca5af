import { useMutation, useQueryClient } from "@tanstack/react-query";
import { settingsResponseSchema, type Settings } from "../../../../shared/schemas/settings.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { settingsKeys } from "./get-settings.ts";

export function updateSettings(settings: Settings) {
  return apiFetch("/api/settings", { method: "PUT", body: settings, schema: settingsResponseSchema });
}

export function useUpdateSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSettings,
    onSuccess: (saved) => queryClient.setQueryData(settingsKeys.all, saved),
  });
}
