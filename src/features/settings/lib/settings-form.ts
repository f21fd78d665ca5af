import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { formFieldOfApiField, settingsFormSchema, type Settings, type SettingsFormFields } from "../../../../shared/schemas/settings.ts";

export const settingsResolver = zodResolver(settingsFormSchema);
export type SettingsFieldName = keyof SettingsFormFields;

const formFields = new Set(Object.keys(settingsFormSchema.in.shape));

const detailsSchema = z.object({ fieldErrors: z.record(z.string(), z.array(z.string())).catch({}), formErrors: z.array(z.string()).catch([]) });

/** The server's per-field messages, named by the form's own fields. */
export function serverFieldErrors(details: unknown): { fields: [SettingsFieldName, string][]; form: string[] } {
  const parsed = detailsSchema.safeParse(details ?? {});
  if (!parsed.success) return { fields: [], form: [] };
  const fields: [SettingsFieldName, string][] = [];
  const form = [...parsed.data.formErrors];
  for (const [name, messages] of Object.entries(parsed.data.fieldErrors)) {
    const field = formFieldOfApiField[name as keyof Settings] ?? name;
    if (messages[0] && formFields.has(field)) fields.push([field as SettingsFieldName, messages[0]]);
    else if (messages[0]) form.push(messages[0]);
  }
  return { fields, form };
}
