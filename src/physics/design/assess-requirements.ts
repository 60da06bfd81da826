/**
 * What a design must achieve to "work", as the assessment (./assess.ts) checks
 * it, with the defaults it states in every answer. The defaults are our own
 * screening choices (no published standard exists for liquid-infused surfaces);
 * each says why beside it.
 */

export interface AssessmentRequirements {
  /** Smallest drag reduction credited at the end of the service time, fraction (default 0.05). */
  minDragReduction?: number;
  /** Service time the retention and drag requirements apply at, s (default options.duration, else 7200). */
  serviceTime?: number;
  /** Smallest share of the groove volume still filled at the service time, 0–1 (default 0.5). */
  minRetainedFraction?: number;
  /**
   * Share of the calm band's load that must stay unused, 0–1 (default 0: calm is enough).
   * The waves verdict's margin m = 1 − Π_max/Π_calm (physics/waves/criteria.ts) must reach it.
   */
  minWaveMargin?: number;
  /** Highest surfactant concentration the design must tolerate, mol/m³ (default: the water's stated concentration). */
  tolerableSurfactantConcentration?: number;
  /** Share of the clean slip that must survive at the tolerable concentration, 0–1 (default 0.5). */
  minSlipRetained?: number;
  /** Smallest heat-transfer change q/q₀ − 1 against the solid-filled wall (default −0.1: at most 10 % less heat). */
  minHeatTransferChange?: number;
}

/** Requirements in effect: every value filled in, with whether the user gave it. */
export type EffectiveRequirements = {
  [K in keyof Required<AssessmentRequirements>]: { value: number | null; source: 'input' | 'default' };
};

/**
 * Defaults (our choices, stated in each answer):
 * - drag reduction 5 %: below a few per cent a turbulent drag reduction is hard to tell from the scatter of a
 *   friction measurement (common practice, no source);
 * - retained half of the groove volume: a surface that has lost more than half of its lubricant within its service
 *   time is draining, not holding (our choice);
 * - calm band with no extra reserve: the calm band already sits a factor 2^(1/4) in pressure under the trade boundary
 *   (src/physics/waves/criteria.ts);
 * - half the clean slip kept at the tolerable concentration: the same "half-slip" concentration the surfactant
 *   endpoint reports;
 * - at most 10 % less heat transfer: a fouling-type allowance an exchanger design usually carries
 *   (common practice, no source);
 * - service time 2 h: the retention endpoint's timeline default.
 */
export const REQUIREMENT_DEFAULTS = {
  minDragReduction: 0.05,
  serviceTime: 7200,
  minRetainedFraction: 0.5,
  minWaveMargin: 0,
  minSlipRetained: 0.5,
  minHeatTransferChange: -0.1,
} as const;

/** The requirements in effect for a document: given values first, then the document's, then the defaults. */
export function effectiveRequirements(
  given: AssessmentRequirements,
  document: { duration?: number; statedConcentration?: number },
): EffectiveRequirements {
  const pick = (value: number | undefined, fallback: number | null) =>
    value === undefined ? { value: fallback, source: 'default' as const } : { value, source: 'input' as const };
  return {
    minDragReduction: pick(given.minDragReduction, REQUIREMENT_DEFAULTS.minDragReduction),
    serviceTime: pick(given.serviceTime, document.duration ?? REQUIREMENT_DEFAULTS.serviceTime),
    minRetainedFraction: pick(given.minRetainedFraction, REQUIREMENT_DEFAULTS.minRetainedFraction),
    minWaveMargin: pick(given.minWaveMargin, REQUIREMENT_DEFAULTS.minWaveMargin),
    tolerableSurfactantConcentration: pick(given.tolerableSurfactantConcentration, document.statedConcentration ?? null),
    minSlipRetained: pick(given.minSlipRetained, REQUIREMENT_DEFAULTS.minSlipRetained),
    minHeatTransferChange: pick(given.minHeatTransferChange, REQUIREMENT_DEFAULTS.minHeatTransferChange),
  };
}
