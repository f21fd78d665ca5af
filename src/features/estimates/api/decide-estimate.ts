import { useMutation } from "@tanstack/react-query";
import { estimateDecisionResponseSchema, type EstimateDecisionRequest } from "../../../../shared/schemas/estimates.ts";
import { apiFetch } from "../../../lib/api-client.ts";

export function decideEstimate(token: string, body: EstimateDecisionRequest) {
  return apiFetch(`/api/public/estimates/${encodeURIComponent(token)}/decision`, { method: "POST", body, schema: estimateDecisionResponseSchema });
}

export function useDecideEstimate(token: string) {
  return useMutation({ mutationFn: (body: EstimateDecisionRequest) => decideEstimate(token, body) });
}
