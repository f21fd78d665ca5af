/** What a key press does to the text of a reading being typed. */
export function pressKey(text: string, key: string): string {
  if (key === "clear") return "";
  if (key === "back") return text.slice(0, -1);
  if (key === "sign") return text.startsWith("-") ? text.slice(1) : `-${text}`;
  if (key === ".") return text.includes(".") ? text : `${text === "" || text === "-" ? `${text}0` : text}.`;
  // A reading has a few digits at most; more is a slip of the thumb.
  if (text.replace(/[-.]/g, "").length >= 7) return text;
  return text === "0" ? key : text === "-0" ? `-${key}` : text + key;
}

const keys: { key: string; label: string; name: string }[] = [
  ..."789".split("").map((d) => ({ key: d, label: d, name: d })),
  { key: "back", label: "⌫", name: "Delete last digit" },
  ..."456".split("").map((d) => ({ key: d, label: d, name: d })),
  { key: "clear", label: "Clear", name: "Clear" },
  ..."123".split("").map((d) => ({ key: d, label: d, name: d })),
  { key: "sign", label: "+/−", name: "Change sign" },
  { key: "0", label: "0", name: "0" },
  { key: ".", label: ".", name: "Decimal point" },
];

/** Benchpath's own keypad: big keys in a fixed grid, so the phone keyboard never covers the step. */
export function NumericKeypad({ onKey }: { onKey: (key: string) => void }) {
  return (
    <div role="group" aria-label="Keypad" className="grid grid-cols-4 gap-3">
      {keys.map(({ key, label, name }) => (
        <button
          key={key}
          type="button"
          aria-label={name}
          onClick={() => onKey(key)}
          className={
            "tabular-figures min-h-16 rounded-lg border-2 border-line-strong bg-raised text-2xl font-semibold text-ink select-none active:bg-sunken " +
            (key === "0" ? "col-span-2" : "")
          }
        >
          {label}
        </button>
      ))}
    </div>
  );
}
