import "@testing-library/jest-dom/vitest";
import { cleanup } from "@testing-library/react";
import { afterEach, beforeEach, vi, type MockInstance } from "vitest";

let consoleError: MockInstance<typeof console.error>;

// A console.error is a bug until a test says otherwise: it fails the test that caused it.
beforeEach(() => {
  const original = console.error;
  consoleError = vi.spyOn(console, "error").mockImplementation((...args: unknown[]) => {
    original(...args);
    throw new Error(`Unexpected console.error: ${args.map(String).join(" ")}`);
  });
});

afterEach(() => {
  cleanup();
  const calls = consoleError.mock.calls;
  consoleError.mockRestore();
  vi.unstubAllGlobals();
  window.localStorage.clear();
  delete document.documentElement.dataset.theme;
  if (calls.length > 0) throw new Error(`console.error was called ${calls.length} time(s): ${calls.map((c) => c.map(String).join(" ")).join("\n")}`);
});
