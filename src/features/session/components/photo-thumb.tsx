import { useEffect, useState } from "react";
import { keptPhoto } from "../api/upload-photo.ts";

/** A photo of the step: the copy still on the tablet while it waits to be sent, else the server's thumbnail. */
export function PhotoThumb({ attachmentId }: { attachmentId: string }) {
  const [src, setSrc] = useState<string | null>(null);
  useEffect(() => {
    let url: string | null = null;
    let live = true;
    keptPhoto(attachmentId)
      .catch(() => undefined)
      .then((blob) => {
        if (!live) return;
        url = blob ? URL.createObjectURL(blob) : null;
        setSrc(url ?? `/api/attachments/${encodeURIComponent(attachmentId)}/thumb`);
      });
    return () => {
      live = false;
      if (url) URL.revokeObjectURL(url);
    };
  }, [attachmentId]);
  return (
    <span className="block size-20 overflow-hidden rounded-md border-2 border-line-strong bg-sunken">
      {src && <img src={src} alt="Photo taken for this step" className="size-full object-cover" />}
    </span>
  );
}
