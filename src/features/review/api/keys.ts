/** Query keys from general to specific: invalidating `all` refreshes the queue, its options and every session. */
export const reviewKeys = {
  all: ["review"] as const,
  queues: () => [...reviewKeys.all, "queue"] as const,
  /** One entry per request: the address's parameters in a fixed order. */
  queue: (request: string) => [...reviewKeys.queues(), request] as const,
  options: () => [...reviewKeys.all, "options"] as const,
  session: (id: string) => [...reviewKeys.all, "session", id] as const,
  flags: (id: string) => [...reviewKeys.all, "flags", id] as const,
};
