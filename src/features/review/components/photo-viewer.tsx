import { useEffect, useId, useRef } from "react";
import { Button } from "../../../components/ui/button.tsx";
import { useFocusTrap } from "../../../lib/use-focus-trap.ts";
import { localDayTime } from "../lib/review-words.ts";

export interface ViewerPhoto {
  attachmentId: string;
  stepTitle: string;
  at: string;
}

export const photoUrl = (attachmentId: string) => `/api/attachments/${encodeURIComponent(attachmentId)}`;

interface PhotoViewerProps {
  photos: readonly ViewerPhoto[];
  index: number;
  onIndex: (index: number) => void;
  onClose: () => void;
}

/** One of the session's photos at full size, with the others a tap (or an arrow key) away. */
export function PhotoViewer({ photos, index, onIndex, onClose }: PhotoViewerProps) {
  const ref = useRef<HTMLDivElement>(null);
  const titleId = useId();
  const captionId = useId();
  useFocusTrap(ref);
  const photo = photos[index];
  const hasPrevious = index > 0;
  const hasNext = index < photos.length - 1;
  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      if (event.key === "Escape") onClose();
      else if (event.key === "ArrowLeft" && hasPrevious) onIndex(index - 1);
      else if (event.key === "ArrowRight" && hasNext) onIndex(index + 1);
    };
    document.addEventListener("keydown", onKey);
    return () => document.removeEventListener("keydown", onKey);
  }, [index, hasPrevious, hasNext, onIndex, onClose]);
  if (!photo) return null;
  return (
    <div className="fixed inset-0 z-30 flex bg-ink/70 p-3 sm:p-6" onClick={onClose}>
      <div
        ref={ref}
        role="dialog"
        aria-modal="true"
        aria-labelledby={titleId}
        aria-describedby={captionId}
        tabIndex={-1}
        className="flex min-h-0 w-full flex-col gap-3 rounded-xl border-2 border-line-strong bg-surface p-4"
        onClick={(event) => event.stopPropagation()}
      >
        <div className="flex items-center justify-between gap-4">
          <h2 id={titleId} className="text-2xl font-semibold tabular-figures">
            Photo {index + 1} of {photos.length}
          </h2>
          <Button data-autofocus onClick={onClose}>
            Close
          </Button>
        </div>
        <p id={captionId}>
          Taken at “{photo.stepTitle}”, {localDayTime(photo.at)}
        </p>
        <img src={photoUrl(photo.attachmentId)} alt={`The photo taken at “${photo.stepTitle}”`} className="min-h-0 w-full flex-1 rounded-lg bg-sunken object-contain" />
        <div className="flex justify-between gap-4">
          <Button onClick={() => onIndex(index - 1)} disabled={!hasPrevious} className="min-w-40">
            Previous photo
          </Button>
          <Button onClick={() => onIndex(index + 1)} disabled={!hasNext} className="min-w-40">
            Next photo
          </Button>
        </div>
      </div>
    </div>
  );
}
