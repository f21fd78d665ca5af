/** Query keys from general to specific. */
export const estimateKeys = {
  all: ["estimates"] as const,
  list: (workOrderId: string) => [...estimateKeys.all, "list", workOrderId] as const,
  public: (token: string) => ["public-estimate", token] as const,
};
