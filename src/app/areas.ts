import { roleLabels, roles, type Role } from "../../shared/schemas/users.ts";

export const areaIds = ["bench", "work-orders", "flows", "review", "insight", "settings", "people"] as const;
export type AreaId = (typeof areaIds)[number];

export interface Area {
  id: AreaId;
  path: string;
  label: string;
  /** What the area is for, in one sentence. */
  summary: string;
}

export const areas: Record<AreaId, Area> = {
  bench: {
    id: "bench",
    path: "/bench",
    label: "Bench",
    summary: "Check in a unit and follow a guided no-start check, step by step.",
  },
  "work-orders": {
    id: "work-orders",
    path: "/work-orders",
    label: "Work orders",
    summary: "Open, follow and close the shop's work orders, from intake to pickup.",
  },
  flows: {
    id: "flows",
    path: "/flows",
    label: "Flows",
    summary: "Write and revise the guided checks apprentices follow at the bench, then publish them.",
  },
  review: {
    id: "review",
    path: "/review",
    label: "Review",
    summary: "Go through finished bench sessions step by step, then sign them off or send them back with a comment.",
  },
  insight: {
    id: "insight",
    path: "/insight",
    label: "Shop insight",
    summary: "See which faults come in most, how long checks take and where sessions stall.",
  },
  settings: {
    id: "settings",
    path: "/settings",
    label: "Shop settings",
    summary: "Set the shop's name, units, labour rate and the details printed on customer reports.",
  },
  people: {
    id: "people",
    path: "/people",
    label: "People",
    summary: "Add people to the shop, set their role and reset their sign-in.",
  },
};

/** Navigation order per role; the first area is the role's home. */
export const areasByRole: Record<Role, readonly [AreaId, ...AreaId[]]> = {
  apprentice: ["bench", "work-orders"],
  senior_tech: ["flows", "bench", "work-orders"],
  shop_lead: ["review", "flows", "insight", "work-orders", "settings", "people"],
};

export function areasFor(role: Role): Area[] {
  return areasByRole[role].map((id) => areas[id]);
}

export function homeAreaFor(role: Role): Area {
  return areas[areasByRole[role][0]];
}

export function canOpenArea(role: Role, area: AreaId): boolean {
  return areasByRole[role].includes(area);
}

/** Role names that may open an area, for telling someone who to ask. */
export function roleLabelsFor(area: AreaId): string[] {
  return roles.filter((role) => canOpenArea(role, area)).map((role) => roleLabels[role]);
}
