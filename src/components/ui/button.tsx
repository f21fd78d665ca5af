import type { ButtonHTMLAttributes } from "react";

type Variant = "primary" | "secondary" | "quiet";
type Size = "main" | "regular";

const base =
  "inline-flex items-center justify-center gap-2 rounded-lg font-semibold select-none " +
  // Not yet possible looks flat and dashed, never like a paler live button.
  "disabled:cursor-not-allowed disabled:border-dashed disabled:border-line-strong disabled:bg-sunken disabled:text-ink-muted";

const variants: Record<Variant, string> = {
  primary: "bg-accent text-accent-ink border-2 border-accent",
  secondary: "bg-raised text-ink border-2 border-line-strong",
  quiet: "bg-transparent text-accent underline underline-offset-4 decoration-2",
};

// Main actions are 64 px tall for gloved thumbs; everything else keeps the 48 px minimum.
const sizes: Record<Size, string> = {
  main: "min-h-16 px-8 py-3 text-xl",
  regular: "min-h-12 min-w-12 px-5 py-2 text-base",
};

export function buttonClasses({ variant = "secondary", size = "regular" }: { variant?: Variant; size?: Size } = {}) {
  return `${base} ${variants[variant]} ${sizes[size]}`;
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: Size;
}

export function Button({ variant, size, className, type = "button", ...props }: ButtonProps) {
  return <button type={type} className={`${buttonClasses({ variant, size })} ${className ?? ""}`} {...props} />;
}
