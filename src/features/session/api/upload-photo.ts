import { uploadedPhotoSchema, type UploadedPhoto } from "../../../../shared/schemas/sessions.ts";
import { apiFetch } from "../../../lib/api-client.ts";

export async function uploadSessionPhoto({ sessionId, stepId, photo }: { sessionId: string; stepId: string; photo: File }): Promise<UploadedPhoto> {
  const body = new FormData();
  body.append("stepId", stepId);
  body.append("photo", photo);
  return apiFetch(`/api/sessions/${encodeURIComponent(sessionId)}/photos`, { method: "POST", body, schema: uploadedPhotoSchema });
}
