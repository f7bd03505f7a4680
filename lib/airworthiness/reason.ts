// Reasons carry how they weigh on the status while they are being collected; the effect is
// dropped from the public result, which keeps only code, text and grounding.

import type { StatusReason } from "./types";

export type ReasonEffect = "grounded" | "unknown" | "limited" | "advisory";

export interface RankedReason extends StatusReason {
  effect: ReasonEffect;
}

export const EFFECT_RANK: Record<ReasonEffect, number> = { grounded: 0, unknown: 1, limited: 2, advisory: 3 };

export function makeReason(effect: ReasonEffect, code: string, text: string): RankedReason {
  return { code, text, grounding: effect === "grounded", effect };
}
