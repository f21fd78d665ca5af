import { useState } from "react";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { useUploadIntakePhoto } from "../api/upload-intake-photo.ts";
import { PhotoPicker } from "./photo-picker.tsx";

/** Where the server serves a saved photo's small version. */
export function attachmentThumbUrl(id: string) {
  return `/api/attachments/${encodeURIComponent(id)}/thumb`;
}

/** The unit as it came in, or a way to add that photo when it is missing. */
export function IntakePhoto({ workOrderId, photoId, notSaved }: { workOrderId: string; photoId: string | null; notSaved: boolean }) {
  const upload = useUploadIntakePhoto();
  const [photo, setPhoto] = useState<File | null>(null);
  const [broken, setBroken] = useState(false);
  const shownId = upload.data?.id ?? photoId;
  const thumb = upload.data?.thumbUrl ?? (shownId ? attachmentThumbUrl(shownId) : null);

  return (
    <section aria-labelledby="intake-photo-title" className="flex flex-col gap-3">
      <h2 id="intake-photo-title" className="text-2xl font-semibold">
        As received
      </h2>
      {thumb && !broken ? (
        <img src={thumb} alt="The unit as it was checked in" onError={() => setBroken(true)} className="max-h-64 w-full max-w-md rounded-lg border-2 border-line-strong object-cover" />
      ) : thumb ? (
        <p className="text-ink-muted">A photo is saved, but it cannot be shown on this tablet right now.</p>
      ) : (
        <>
          {upload.isError && <FormProblem title="The photo did not save.">Check the tablet's connection, then save it again.</FormProblem>}
          <PhotoPicker label="Take a photo" hint={notSaved ? "The photo taken at check-in did not save: take it again, then save it." : "No photo of the unit as received yet."} photo={photo} onChange={setPhoto} disabled={upload.isPending} />
          {photo && (
            <Button variant="secondary" disabled={upload.isPending} onClick={() => upload.mutate({ workOrderId, photo })} className="self-start">
              {upload.isPending ? "Saving the photo…" : "Save the photo"}
            </Button>
          )}
        </>
      )}
    </section>
  );
}
