import { useTheme } from "../../lib/theme.ts";

export function ContrastToggle() {
  const { theme, toggle } = useTheme();
  const on = theme === "contrast";
  return (
    <button
      type="button"
      aria-pressed={on}
      onClick={toggle}
      className="inline-flex min-h-12 items-center gap-2 rounded-lg border-2 border-line-strong bg-raised px-3 text-base font-medium text-ink"
    >
      <svg viewBox="0 0 24 24" className="size-6 shrink-0" aria-hidden="true" focusable="false">
        <circle cx="12" cy="12" r="9.5" fill="none" strokeWidth="2.2" className="stroke-ink" />
        <path d="M12 2.5a9.5 9.5 0 0 1 0 19z" className="fill-ink" />
      </svg>
      High contrast
      <span aria-hidden="true" className="rounded bg-sunken px-1.5 text-sm font-semibold uppercase">
        {on ? "on" : "off"}
      </span>
    </button>
  );
}
