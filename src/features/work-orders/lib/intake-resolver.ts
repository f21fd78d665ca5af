import { zodResolver } from "@hookform/resolvers/zod";
import { get, type FieldError, type Resolver } from "react-hook-form";
import { createWorkOrderRequestSchema } from "../../../../shared/schemas/work-orders.ts";
import type { IntakeFields, IntakeValues } from "./intake-fields.ts";

const checkWithContract = zodResolver(createWorkOrderRequestSchema);

/**
 * The contract through zodResolver, except that a union's own message (2-stroke or 4-stroke) wins:
 * the resolver reports the first branch's "expected 2" instead.
 */
export const intakeResolver: Resolver<IntakeFields, unknown, IntakeValues> = async (values, context, options) => {
  const result = await checkWithContract(values, context, options);
  if (Object.keys(result.errors).length === 0) return result;
  const parsed = createWorkOrderRequestSchema.safeParse(values);
  for (const issue of parsed.error?.issues ?? []) {
    if (issue.code !== "invalid_union") continue;
    const shown = get(result.errors, issue.path.join(".")) as FieldError | undefined;
    if (shown) shown.message = issue.message;
  }
  return result;
};
