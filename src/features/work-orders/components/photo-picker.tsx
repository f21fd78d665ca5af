import { useEffect, useId, useMemo } from "react";
import { buttonClasses } from "../../../components/ui/button.tsx";

interface PhotoPickerProps {
  label: string;
  hint: string;
  photo: File | null;
  onChange: (photo: File | null) => void;
  disabled?: boolean;
}

/** Opens the tablet's back camera; shows what was taken so a blurred shot can be taken again. */
export function PhotoPicker({ label, hint, photo, onChange, disabled }: PhotoPickerProps) {
  const inputId = useId();
  const hintId = `${inputId}-hint`;
  const preview = usePreviewUrl(photo);
  return (
    <div className="flex flex-col gap-3">
      <p id={hintId} className="max-w-[65ch] text-ink-muted">
        {hint}
      </p>
      <div className="flex flex-wrap items-center gap-4">
        {preview && <img src={preview} alt="The photo about to be saved" className="h-40 w-56 rounded-lg border-2 border-line-strong object-cover" />}
        <label htmlFor={inputId} className={`${buttonClasses({ variant: "secondary" })} min-h-14 has-focus-visible:outline-3 has-focus-visible:outline-focus`}>
          <CameraGlyph />
          {photo ? "Take it again" : label}
          <input
            id={inputId}
            type="file"
            accept="image/*"
            capture="environment"
            aria-describedby={hintId}
            disabled={disabled}
            className="sr-only"
            onChange={(event) => onChange(event.currentTarget.files?.[0] ?? null)}
          />
        </label>
        {photo && (
          <button type="button" className={buttonClasses({ variant: "quiet" })} disabled={disabled} onClick={() => onChange(null)}>
            Leave the photo out
          </button>
        )}
      </div>
    </div>
  );
}

function usePreviewUrl(photo: File | null) {
  // jsdom and very old browsers have no object URLs: the picker still works, only without a preview.
  const url = useMemo(() => (photo && typeof URL.createObjectURL === "function" ? URL.createObjectURL(photo) : null), [photo]);
  useEffect(() => () => {
    if (url) URL.revokeObjectURL(url);
  }, [url]);
  return url;
}

function CameraGlyph() {
  return (
    <svg viewBox="0 0 24 24" className="size-7 shrink-0" aria-hidden="true" focusable="false">
      <path d="M4 8h3l1.6-2.4h6.8L17 8h3v11H4z" fill="none" strokeWidth="2.2" strokeLinejoin="round" className="stroke-current" />
      <circle cx="12" cy="13.3" r="3.4" fill="none" strokeWidth="2.2" className="stroke-current" />
    </svg>
  );
}
