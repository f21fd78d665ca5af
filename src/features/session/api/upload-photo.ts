import { apiErrorSchema } from "../../../../shared/schemas/common.ts";
import { uploadedPhotoSchema, type UploadedPhoto } from "../../../../shared/schemas/sessions.ts";
import { ApiRequestError, clientErrorIds } from "../../../lib/api-client.ts";

// A multipart body, so the JSON helper does not fit; errors still come back as ApiRequestError.
export async function uploadSessionPhoto({ sessionId, stepId, photo }: { sessionId: string; stepId: string; photo: File }): Promise<UploadedPhoto> {
  const body = new FormData();
  body.append("stepId", stepId);
  body.append("photo", photo);
  let response: Response;
  try {
    response = await fetch(`/api/sessions/${encodeURIComponent(sessionId)}/photos`, { method: "POST", body, headers: { accept: "application/json" }, credentials: "same-origin" });
  } catch {
    throw new ApiRequestError({ status: 0, id: clientErrorIds.offline, message: "The server could not be reached." });
  }
  const payload: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const parsed = apiErrorSchema.safeParse(payload);
    const error = parsed.success ? parsed.data.error : { id: clientErrorIds.unexpectedResponse, message: `The server answered ${response.status}.` };
    throw new ApiRequestError({ status: response.status, ...error });
  }
  const parsed = uploadedPhotoSchema.safeParse(payload);
  if (!parsed.success) throw new ApiRequestError({ status: response.status, id: clientErrorIds.unexpectedResponse, message: "The server's answer was not understood." });
  return parsed.data;
}
