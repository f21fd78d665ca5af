import { z } from "zod";
import { unitSystems } from "../equipment.ts";

export const roles = ["apprentice", "senior_tech", "shop_lead"] as const;
export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  apprentice: "Apprentice",
  senior_tech: "Senior tech",
  shop_lead: "Shop lead",
};

export const publicUserSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: z.enum(roles),
  unitSystem: z.enum(unitSystems),
});
export type PublicUser = z.infer<typeof publicUserSchema>;
