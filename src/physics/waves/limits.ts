/**
 * What the wave evaluation reports beyond the verdict: the design limits (the
 * widest groove, lowest interfacial tension and highest friction velocity that
 * keep the interface calm, each with everything else held fixed) and the regime
 * map over (We_τ, w⁺) for plotting. Both evaluate ./criteria.ts at other design
 * points of the same flow and fluids.
 */
import { evaluateCriteria, marginOf, regimeOf, solveOnLogScale, type CriteriaEvaluation, type DesignPoint, type FixedConditions, type WaveRegime } from './criteria.js';

export interface DesignLimits {
  /** Widest groove keeping the regime calm, m; null if outside the searched range. */
  maxGrooveWidth: number | null;
  /** Lowest interfacial tension keeping it calm, N/m. */
  minInterfacialTension: number | null;
  /** Highest friction velocity this design tolerates calm, m/s. */
  maxFrictionVelocity: number | null;
}

/** The edges of the calm band in groove width, tension and friction velocity: where the verdict margin is zero. */
export function designLimits(fixed: FixedConditions, design: DesignPoint): DesignLimits {
  const marginAt = (point: DesignPoint) => marginOf(evaluateCriteria(fixed, point).ratios);
  return {
    maxGrooveWidth: solveOnLogScale((width) => marginAt({ ...design, grooveWidth: width }), design.grooveWidth),
    minInterfacialTension: solveOnLogScale((tension) => marginAt({ ...design, interfacialTension: tension }), design.interfacialTension),
    maxFrictionVelocity: solveOnLogScale((velocity) => marginAt({ ...design, frictionVelocity: velocity }), design.frictionVelocity),
  };
}

export interface RegimeMap {
  /** Column abscissae, We_τ (log-spaced). */
  frictionCapillaryNumbers: number[];
  /** Row ordinates, w⁺ (log-spaced). */
  grooveWidthsPlus: number[];
  /** regimes[row][column] at (w⁺_row, We_τ,column) with this flow and fluids. */
  regimes: WaveRegime[][];
  /** For each column, the w⁺ where max Π = 1 (the trade boundary Λ = 1 when the scaling governs), null outside the search range. */
  boundaryGrooveWidthPlus: (number | null)[];
  designPoint: { frictionCapillaryNumber: number; grooveWidthPlus: number };
}

/**
 * Regime over a resolution × resolution grid of We_τ (two decades either side of
 * the design) and w⁺ (a decade beyond the design and the Λ = 1 boundary), at the
 * design's friction velocity, varying the groove width and the interfacial tension.
 */
export function regimeMap(fixed: FixedConditions, at: CriteriaEvaluation, workingViscosity: number, frictionVelocity: number, resolution: number): RegimeMap {
  const designWeT = at.frictionCapillaryNumber;
  const designWPlus = at.grooveWidthPlus;
  const boundaryAtDesign = Math.cbrt(1 / designWeT);
  const wPlusLow = Math.min(designWPlus, boundaryAtDesign) / 10;
  const wPlusHigh = Math.max(designWPlus, boundaryAtDesign) * 10;
  const logSpace = (lo: number, hi: number, i: number) => lo * (hi / lo) ** (i / (resolution - 1));
  const frictionCapillaryNumbers = Array.from({ length: resolution }, (_, i) => logSpace(designWeT / 100, designWeT * 100, i));
  const grooveWidthsPlus = Array.from({ length: resolution }, (_, i) => logSpace(wPlusLow, wPlusHigh, i));
  const viscousLength = at.viscousLength;
  const pointFor = (weT: number, wPlus: number): DesignPoint => ({
    grooveWidth: wPlus * viscousLength,
    interfacialTension: (workingViscosity * frictionVelocity) / weT,
    frictionVelocity,
  });
  const regimes = grooveWidthsPlus.map((wPlus) =>
    frictionCapillaryNumbers.map((weT) => regimeOf(evaluateCriteria(fixed, pointFor(weT, wPlus)).ratios)),
  );
  const boundaryGrooveWidthPlus = frictionCapillaryNumbers.map((weT) =>
    solveOnLogScale((wPlus) => 1 - Math.max(...Object.values(evaluateCriteria(fixed, pointFor(weT, wPlus)).ratios)), Math.cbrt(1 / weT)),
  );
  return {
    frictionCapillaryNumbers,
    grooveWidthsPlus,
    regimes,
    boundaryGrooveWidthPlus,
    designPoint: { frictionCapillaryNumber: designWeT, grooveWidthPlus: designWPlus },
  };
}
