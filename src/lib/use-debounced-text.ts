import { useEffect, useRef, useState } from "react";

/**
 * Text typed into a box that stands for a value kept elsewhere (the address): handed to `commit`
 * once typing pauses, and following the value when it changes under the box (the back button).
 */
export function useDebouncedText(value: string, commit: (text: string) => void, delayMs = 300): [string, (text: string) => void] {
  const [typed, setTyped] = useState(value);
  const [seen, setSeen] = useState(value);
  if (value !== seen) {
    setSeen(value);
    setTyped(value);
  }
  // The latest commit, so a parent's new callback on every render does not restart the pause.
  const latest = useRef(commit);
  useEffect(() => {
    latest.current = commit;
  });
  useEffect(() => {
    if (typed === value) return;
    const timer = setTimeout(() => latest.current(typed), delayMs);
    return () => clearTimeout(timer);
  }, [typed, value, delayMs]);
  return [typed, setTyped];
}
