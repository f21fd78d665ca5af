import { buttonClasses } from "../../../components/ui/button.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { useDebouncedText } from "../../../lib/use-debounced-text.ts";

/** Customer or unit, sent once typing pauses; follows the address when the back button changes it. */
export function QueueSearch({ value, error, onSearch }: { value: string; error?: string; onSearch: (text: string) => void }) {
  const [typed, setTyped] = useDebouncedText(value, onSearch);
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
