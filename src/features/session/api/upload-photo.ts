// A session's photo is kept on the tablet first and sent in the session's save line, before the
// event that names it: the tech goes on at once, with or without a connection.
import type { MutationOptions, QueryClient } from "@tanstack/react-query";
import { del, delMany, get, keys, set } from "idb-keyval";
import { uploadedPhotoSchema, type UploadedPhoto } from "../../../../shared/schemas/sessions.ts";
import { apiFetch, ApiRequestError } from "../../../lib/api-client.ts";
import { isUnreachable, retryDelay } from "./save-rules.ts";

export const sessionPhotoKey = ["session-photo"] as const;

export interface PhotoVariables {
  sessionId: string;
  stepId: string;
  /** Chosen on the tablet: the upload and the photo.attach event both name it. */
  attachmentId: string;
}

/** The camera's own limit on the server is 10 MB; a bigger file is refused before it is queued. */
export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;

const PREFIX = "benchpath-photo-";
const blobKey = (attachmentId: string) => `${PREFIX}${attachmentId}`;

/** Why the file cannot be a photo for the session, or null; the server checks the bytes again. */
export function photoFileProblem(file: File): string | null {
  if (!file.type.startsWith("image/")) return "That file is not a picture. Take the photo with the camera.";
  if (file.size > MAX_PHOTO_BYTES) return `That picture is over ${MAX_PHOTO_BYTES / 1024 / 1024} MB. Take it again at a lower resolution.`;
  return null;
}

// Kept as bytes and a type, not as a Blob: plain data survives every browser's IndexedDB.
interface KeptPhoto {
  type: string;
  bytes: ArrayBuffer;
}

/** Keeps the picture in the tablet's storage until the server has it. */
export async function keepPhoto(attachmentId: string, photo: Blob): Promise<void> {
  await set(blobKey(attachmentId), { type: photo.type, bytes: await photo.arrayBuffer() } satisfies KeptPhoto);
}

/** A kept picture, for sending it or showing it before it is sent. */
export async function keptPhoto(attachmentId: string): Promise<Blob | undefined> {
  const kept = await get<KeptPhoto>(blobKey(attachmentId));
  return kept ? new Blob([kept.bytes], { type: kept.type }) : undefined;
}

/** Signing out leaves no pictures behind on a shared tablet. */
export async function forgetKeptPhotos(): Promise<void> {
  const all = await keys();
  await delMany(all.filter((k) => typeof k === "string" && k.startsWith(PREFIX)));
}

export async function uploadSessionPhoto({ sessionId, stepId, attachmentId }: PhotoVariables): Promise<UploadedPhoto> {
  const photo = await keptPhoto(attachmentId);
  if (!photo) throw new ApiRequestError({ status: 410, id: "photo_gone", message: "The photo is no longer on this tablet; take it again." });
  const body = new FormData();
  body.append("stepId", stepId);
  body.append("id", attachmentId);
  body.append("photo", photo, "photo");
  return apiFetch(`/api/sessions/${encodeURIComponent(sessionId)}/photos`, { method: "POST", body, schema: uploadedPhotoSchema });
}

/** How a kept photo is sent, for the live screen and for saves restored from storage alike. */
export function sessionPhotoOptions() {
  return {
    mutationKey: sessionPhotoKey,
    mutationFn: uploadSessionPhoto,
    networkMode: "online" as const,
    retry: (_count: number, error: unknown) => isUnreachable(error),
    retryDelay,
    gcTime: Infinity,
    onSuccess: (_photo: UploadedPhoto, { attachmentId }: PhotoVariables) => del(blobKey(attachmentId)),
    // Refused for good (not a picture, too big): the event naming it is refused next and the step asks again.
    onError: (_error: unknown, { attachmentId }: PhotoVariables) => del(blobKey(attachmentId)),
  } satisfies MutationOptions<UploadedPhoto, unknown, PhotoVariables>;
}

export function registerSessionPhotoDefaults(queryClient: QueryClient) {
  queryClient.setMutationDefaults(sessionPhotoKey, sessionPhotoOptions());
}
