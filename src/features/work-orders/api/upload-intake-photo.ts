import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { apiFetch } from "../../../lib/api-client.ts";
import { workOrderKeys } from "./keys.ts";

const uploadedPhotoSchema = z.object({ id: z.string(), url: z.string(), thumbUrl: z.string() });
export type UploadedPhoto = z.infer<typeof uploadedPhotoSchema>;

export async function uploadIntakePhoto({ workOrderId, photo }: { workOrderId: string; photo: File }): Promise<UploadedPhoto> {
  const body = new FormData();
  body.append("photo", photo);
  return apiFetch(`/api/work-orders/${encodeURIComponent(workOrderId)}/intake-photo`, { method: "POST", body, schema: uploadedPhotoSchema });
}

export function useUploadIntakePhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadIntakePhoto,
    onSuccess: (_photo, { workOrderId }) => queryClient.invalidateQueries({ queryKey: workOrderKeys.detail(workOrderId) }),
  });
}
