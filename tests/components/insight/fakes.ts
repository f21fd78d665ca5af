import type { InsightResponse } from "../../../shared/schemas/insight.ts";

/** An invented shop's month: two flows, three techs, one finding whose name needs quoting in a CSV. */
export function buildInsight(overrides: Partial<InsightResponse> = {}): InsightResponse {
  return {
    from: "2026-03-01",
    to: "2026-03-31",
    totals: { sessions: 57, completed: 48, abandoned: 6, open: 3, reviewed: 40, returned: 9, returnRate: 0.225, medianMinutesToFinding: 65.4, flaggedSessions: 11 },
    findingsByFlow: [
      { flowId: "trimmer-no-start", flowTitle: "Trimmer will not start", findingStepId: "fuel/stale", findingTitle: "Stale fuel in the tank", count: 21 },
      { flowId: "trimmer-no-start", flowTitle: "Trimmer will not start", findingStepId: "carb/float", findingTitle: 'Carb "float" stuck, needle worn', count: 14 },
      { flowId: "mower-no-start", flowTitle: "Mower will not start", findingStepId: "spark/plug", findingTitle: "Fouled spark plug", count: 13 },
    ],
    findingsByEquipment: [
      { equipmentKind: "string_trimmer", findingTitle: "Stale fuel in the tank", count: 17 },
      { equipmentKind: "walk_behind_mower", findingTitle: "Fouled spark plug", count: 13 },
      { equipmentKind: "chainsaw", findingTitle: 'Carb "float" stuck, needle worn', count: 14 },
    ],
    timeToFinding: [
      { flowId: "mower-no-start", flowTitle: "Mower will not start", completed: 13, medianMinutes: 18.2 },
      { flowId: "trimmer-no-start", flowTitle: "Trimmer will not start", completed: 35, medianMinutes: 65 },
    ],
    techs: [
      { techId: "t-1", techName: "Ines Calloway", sessions: 30, completed: 26, reviewed: 22, returned: 3, returnRate: 3 / 22, flags: 7, flaggedSessions: 5 },
      { techId: "t-2", techName: "Oren Blakely", sessions: 20, completed: 16, reviewed: 14, returned: 6, returnRate: 6 / 14, flags: 9, flaggedSessions: 6 },
      { techId: "t-3", techName: "Pia Nakamura", sessions: 7, completed: 6, reviewed: 0, returned: 0, returnRate: null, flags: 0, flaggedSessions: 0 },
    ],
    ...overrides,
  };
}
