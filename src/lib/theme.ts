import { useCallback, useSyncExternalStore } from "react";

export type ThemeName = "standard" | "contrast";

const storageKey = "benchpath.theme";
const listeners = new Set<() => void>();

function readStoredTheme(): ThemeName {
  try {
    return window.localStorage.getItem(storageKey) === "contrast" ? "contrast" : "standard";
  } catch {
    return "standard";
  }
}

function currentTheme(): ThemeName {
  return document.documentElement.dataset.theme === "contrast" ? "contrast" : "standard";
}

function applyTheme(theme: ThemeName) {
  if (theme === "contrast") document.documentElement.dataset.theme = "contrast";
  else delete document.documentElement.dataset.theme;
}

/** Called once before the first render so the page never flashes the other theme. */
export function applyStoredTheme() {
  applyTheme(readStoredTheme());
}

export function setTheme(theme: ThemeName) {
  applyTheme(theme);
  try {
    window.localStorage.setItem(storageKey, theme);
  } catch {
    // Private browsing can refuse storage; the choice then lasts until the page reloads.
  }
  listeners.forEach((listener) => listener());
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useTheme() {
  const theme = useSyncExternalStore(subscribe, currentTheme, () => "standard" as const);
  const toggle = useCallback(() => setTheme(theme === "contrast" ? "standard" : "contrast"), [theme]);
  return { theme, toggle };
}
