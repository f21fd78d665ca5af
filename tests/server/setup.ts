import { afterEach, beforeEach, vi } from "vitest";

// A server test that makes the code print an error is a failing test.
let errors: unknown[][] = [];
beforeEach(() => {
  errors = [];
  vi.spyOn(console, "error").mockImplementation((...args: unknown[]) => {
    errors.push(args);
  });
});
afterEach(() => {
  vi.restoreAllMocks();
  if (errors.length > 0) throw new Error(`Unexpected console.error: ${errors.map((a) => a.map(String).join(" ")).join("\n")}`);
});
