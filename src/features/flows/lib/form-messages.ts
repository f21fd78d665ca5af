// Plain words for zod's default messages in the editor's forms; a schema's own message always wins.
import type { z } from "zod";

function friendly(issue: z.core.$ZodRawIssue): string | undefined {
  switch (issue.code) {
    case "too_small": {
      const min = Number(issue.minimum);
      if (issue.origin === "string") return min === 1 ? "Fill this in." : `Use at least ${min} characters.`;
      if (issue.origin === "array") return min === 1 ? "Choose at least one." : `Give at least ${min}.`;
      return `Use ${min} or more.`;
    }
    case "too_big": {
      const max = Number(issue.maximum);
      if (issue.origin === "string") return `Use at most ${max} characters.`;
      if (issue.origin === "array") return `Give at most ${max}.`;
      return `Use ${max} or less.`;
    }
    case "invalid_type":
      if (issue.expected === "int") return "Use a whole number.";
      if (issue.expected === "number") return "Enter a number.";
      if (issue.expected === "string") return "Fill this in.";
      return undefined;
    case "invalid_value":
      return "Choose one from the list.";
    case "unrecognized_keys":
      return `Benchpath does not know ${issue.keys.map((k) => `“${k}”`).join(", ")}: take it out of the file.`;
    default:
      return undefined;
  }
}

/** Parse options for zodResolver in every step form. */
export const editorParse = { error: friendly };

/** An empty target says what to do rather than the slug rule. */
export function targetMessage(value: unknown, message: string | undefined): string | undefined {
  if (message === undefined) return undefined;
  return value === "" || value === undefined ? "Choose the step this leads to." : message;
}
