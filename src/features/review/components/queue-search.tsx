import { useEffect, useState } from "react";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";

const searchDelayMs = 300;

/** Customer or unit, sent once typing pauses; follows the address when the back button changes it. */
export function QueueSearch({ value, error, onSearch }: { value: string; error?: string; onSearch: (text: string) => void }) {
  const [typed, setTyped] = useState(value);
  const [seen, setSeen] = useState(value);
  if (value !== seen) {
    setSeen(value);
    setTyped(value);
  }
  useEffect(() => {
    if (typed === value) return;
    const timer = setTimeout(() => onSearch(typed), searchDelayMs);
    return () => clearTimeout(timer);
  }, [typed, value, onSearch]);
  return (
    <TextField
      id="queue-search"
      label="Find a customer or unit"
      hint="Customer's name, make or model"
      type="search"
      autoComplete="off"
      value={typed}
      error={error}
      onChange={(event) => setTyped(event.currentTarget.value)}
      className="[&_input::-webkit-search-cancel-button]:appearance-none"
      trailing={
        typed !== "" && (
          <button type="button" className={`${buttonClasses({ variant: "secondary" })} min-h-14`} onClick={() => setTyped("")}>
            Clear
          </button>
        )
      }
    />
  );
}
