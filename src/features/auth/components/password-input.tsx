import { useState, type ComponentProps } from "react";
import { TextField } from "../../../components/ui/text-field.tsx";
import { buttonClasses } from "../../../components/ui/button.tsx";

type PasswordInputProps = Omit<ComponentProps<typeof TextField>, "type" | "trailing">;

export function PasswordInput({ id, ...props }: PasswordInputProps) {
  const [visible, setVisible] = useState(false);
  return (
    <TextField
      id={id}
      type={visible ? "text" : "password"}
      trailing={
        <button
          type="button"
          aria-controls={id}
          aria-label={visible ? "Hide password" : "Show password"}
          onClick={() => setVisible((shown) => !shown)}
          className={`${buttonClasses({ variant: "secondary" })} min-w-24 shrink-0`}
        >
          {visible ? "Hide" : "Show"}
        </button>
      }
      {...props}
    />
  );
}
