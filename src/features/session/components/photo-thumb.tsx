import { createContext, useContext, useEffect, useState } from "react";
import { keptPhoto } from "../api/upload-photo.ts";

/** A picture's address; `owned` when the thumbnail made it and must let it go. */
export interface PhotoAddress {
  url: string;
  owned: boolean;
}

/** Where a step's photo is shown from, or null for the server's thumbnail. */
export type PhotoSource = (attachmentId: string) => Promise<PhotoAddress | null>;

// On the bench: the copy still on the tablet while it waits to be sent.
async function benchSource(attachmentId: string): Promise<PhotoAddress | null> {
  const blob = await keptPhoto(attachmentId).catch(() => undefined);
  return blob ? { url: URL.createObjectURL(blob), owned: true } : null;
}

export const PhotoSourceContext = createContext<PhotoSource>(benchSource);

export function PhotoThumb({ attachmentId }: { attachmentId: string }) {
  const source = useContext(PhotoSourceContext);
  const [src, setSrc] = useState<string | null>(null);
  useEffect(() => {
    let owned: string | null = null;
    let live = true;
    void source(attachmentId).then((address) => {
      if (!live) {
        if (address?.owned) URL.revokeObjectURL(address.url);
        return;
      }
      if (address?.owned) owned = address.url;
      setSrc(address?.url ?? `/api/attachments/${encodeURIComponent(attachmentId)}/thumb`);
    });
    return () => {
      live = false;
      if (owned) URL.revokeObjectURL(owned);
    };
  }, [attachmentId, source]);
  return (
    <span className="block size-20 overflow-hidden rounded-md border-2 border-line-strong bg-sunken">
      {src && <img src={src} alt="Photo taken for this step" className="size-full object-cover" />}
    </span>
  );
}
