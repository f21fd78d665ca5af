import { z } from "zod";

/** The one shape every API error takes. */
export const apiErrorSchema = z.object({
  error: z.object({
    id: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;

/** Details of an `invalid_input` error: messages per field, plus form-wide ones. */
export interface InvalidInputDetails {
  fieldErrors: Record<string, string[]>;
  formErrors: string[];
}
