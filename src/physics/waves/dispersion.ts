/**
 * Linear stability of the lubricant–working-fluid interface as a two-layer
 * problem: inviscid potential flow in each layer, capillarity, gravity, finite
 * layer depths and the pinned fundamental spanwise mode of a groove. Growth
 * rate, neutral curve, intrinsic wave speed and their extrema over the
 * streamwise wavenumber. SI units throughout.
 *
 * Sources: Chandrasekhar 1961 ch. XI (chandrasekhar1961), Drazin & Reid 1981
 * (drazinReid1981), Lamb 1932 §§267–268 (lamb1932); full citations in
 * src/core/references.ts. The confinement by the groove is derived here.
 */
import { scanAndRefineMinimum } from '../../numerics/minimize.js';

/**
 * A plane interface between a wall-side layer (the lubricant in the groove,
 * "layer 1") and an outer layer (the working fluid, "layer 2"), each in
 * uniform motion along x. SI units throughout.
 */
export interface TwoLayerInterface {
  /** ρ₁, kg/m³, of the wall-side layer (> 0). */
  wallSideDensity: number;
  /** ρ₂, kg/m³, of the outer layer (> 0). */
  outerDensity: number;
  /** h₁, m, depth of the wall-side layer (groove depth); omitted = deep. */
  wallSideDepth?: number;
  /** h₂, m, depth of the outer layer to the opposite wall or symmetry plane; omitted = deep. */
  outerDepth?: number;
  /** U₁, m/s. */
  wallSideVelocity: number;
  /** U₂, m/s. */
  outerVelocity: number;
  /** γ, N/m (> 0). */
  interfacialTension: number;
  /**
   * g_⊥, m/s²: component of gravity pointing from the outer layer into the
   * wall-side layer. Positive with a denser wall-side layer is stabilising
   * (lubricant below water on an upward-facing wall).
   */
  normalGravity: number;
  /** m, rad/m: spanwise wavenumber of the pinned mode, π/w; 0 = unconfined interface. */
  spanwiseWavenumber: number;
}

/** coth(x) for x > 0, exact to rounding for large x and via the series for tiny x. */
function hyperbolicCotangent(x: number): number {
  if (x > 20) return 1;
  if (x < 1e-4) return 1 / x + x / 3;
  return 1 / Math.tanh(x);
}

/** ρ_j coth(K h_j): the added inertia of layer j per unit area times K. */
function layerInertia(density: number, depth: number | undefined, totalWavenumber: number): number {
  if (depth === undefined) return density;
  return density * hyperbolicCotangent(totalWavenumber * depth);
}

interface DispersionTerms {
  /** K = √(k² + m²), rad/m. */
  total: number;
  /** a₁ = ρ₁ coth(K h₁). */
  inertia1: number;
  /** a₂ = ρ₂ coth(K h₂). */
  inertia2: number;
  /** R = (ρ₁ − ρ₂) g_⊥ + γK², Pa/m: restoring pressure per unit displacement. */
  restoring: number;
}

function dispersionTerms(layers: TwoLayerInterface, streamwiseWavenumber: number): DispersionTerms {
  // √(k² + m²) written out: Math.hypot's overflow guard is not needed below k ≈ 1e154 and costs several products.
  const total = Math.sqrt(streamwiseWavenumber * streamwiseWavenumber + layers.spanwiseWavenumber * layers.spanwiseWavenumber);
  return {
    total,
    inertia1: layerInertia(layers.wallSideDensity, layers.wallSideDepth, total),
    inertia2: layerInertia(layers.outerDensity, layers.outerDepth, total),
    restoring: (layers.wallSideDensity - layers.outerDensity) * layers.normalGravity + layers.interfacialTension * total * total,
  };
}

/**
 * Temporal growth rate σ = Im ω of the interface mode η ∝ cos(mz) e^{i(kx − ωt)}.
 *
 * Linearised inviscid potential flow in each layer, potential
 * φ_j ∝ cos(mz) e^{ikx} cosh(K(h_j ∓ y)) with the total wavenumber
 * K = √(k² + m²) (Laplace's equation in three dimensions: the decay away
 * from the interface and the coth(K h_j) depth factor both use K, not k);
 * kinematic condition on each side, and the normal-stress jump balanced by
 * gravity and by the capillary pressure of the doubly curved interface,
 * γ(k² + m²)η. The pinned groove interface is represented by its
 * fundamental spanwise mode cos(πz/w), m = π/w (a one-mode approximation:
 * the sidewall condition of the lubricant is not imposed exactly). This
 * gives (Chandrasekhar 1961, ch. XI, eq. for two uniform streams, extended
 * by the finite depths of Drazin & Reid 1981 and the spanwise mode):
 *
 *   a₁(ω − kU₁)² + a₂(ω − kU₂)² = K R,   a_j = ρ_j coth(K h_j),
 *   R = (ρ₁ − ρ₂) g_⊥ + γK²,
 *
 *   ω = k(a₁U₁ + a₂U₂)/(a₁ + a₂) ± √( K R/(a₁ + a₂) − k² a₁a₂ ΔU²/(a₁ + a₂)² ),
 *
 * ΔU = U₂ − U₁, so σ² = k² a₁a₂ΔU²/(a₁ + a₂)² − K R/(a₁ + a₂) when positive.
 *
 * @param layers the two layers (SI).
 * @param streamwiseWavenumber k, rad/m (≥ 0).
 * @returns σ, 1/s (0 for a neutral mode). Validity: inviscid, small slope,
 *   uniform streams (the shear inside each layer is ignored).
 */
export function interfaceGrowthRate(layers: TwoLayerInterface, streamwiseWavenumber: number): number {
  const t = dispersionTerms(layers, streamwiseWavenumber);
  if (!(t.total > 0)) return 0;
  const sum = t.inertia1 + t.inertia2;
  const deltaU = layers.outerVelocity - layers.wallSideVelocity;
  const driving = (streamwiseWavenumber ** 2 * t.inertia1 * t.inertia2 * deltaU ** 2) / (sum * sum);
  const growthSquared = driving - (t.total * t.restoring) / sum;
  return growthSquared > 0 && Number.isFinite(growthSquared) ? Math.sqrt(growthSquared) : 0;
}

/**
 * Velocity difference at which the mode of streamwise wavenumber k is
 * neutral: ΔU_n²(k) = (a₁ + a₂) K R/(k² a₁a₂) (set σ = 0 in
 * {@link interfaceGrowthRate}; same references and validity).
 * @param layers the two layers (SI; the velocities are not used).
 * @param streamwiseWavenumber k, rad/m.
 * @returns ΔU_n, m/s; 0 when R ≤ 0 (statically unstable at that K);
 *   Number.MAX_VALUE for k = 0 with R > 0 (no finite ΔU destabilises it).
 */
export function neutralVelocityDifference(layers: TwoLayerInterface, streamwiseWavenumber: number): number {
  const t = dispersionTerms(layers, streamwiseWavenumber);
  if (!(t.restoring > 0) || !(t.total > 0)) return 0;
  if (!(streamwiseWavenumber > 0)) return Number.MAX_VALUE;
  const value = Math.sqrt(((t.inertia1 + t.inertia2) * t.total * t.restoring) / (streamwiseWavenumber ** 2 * t.inertia1 * t.inertia2));
  return Number.isFinite(value) ? value : Number.MAX_VALUE;
}

/**
 * Intrinsic phase speed of the neutral wave at rest (U₁ = U₂ = 0),
 * c(k) = √(K R/(a₁ + a₂))/k (the dispersion relation of
 * {@link interfaceGrowthRate} with ΔU = 0; for a deep free surface it is
 * Lamb's c² = g/k + γk/ρ, Lamb 1932 §267).
 * @param layers the two layers (SI; the velocities are not used).
 * @param streamwiseWavenumber k, rad/m.
 * @returns c, m/s; 0 where R ≤ 0; Number.MAX_VALUE for k = 0 with R > 0.
 */
export function intrinsicPhaseSpeed(layers: TwoLayerInterface, streamwiseWavenumber: number): number {
  const t = dispersionTerms(layers, streamwiseWavenumber);
  if (!(t.restoring > 0) || !(streamwiseWavenumber > 0)) return t.restoring > 0 ? Number.MAX_VALUE : 0;
  const value = Math.sqrt((t.total * t.restoring) / (t.inertia1 + t.inertia2)) / streamwiseWavenumber;
  return Number.isFinite(value) ? value : Number.MAX_VALUE;
}

/** Reference wavenumber that sets the scan range: m, else the capillary wavenumber √(|Δρ g_⊥|/γ). */
function referenceWavenumber(layers: TwoLayerInterface): number {
  if (layers.spanwiseWavenumber > 0) return layers.spanwiseWavenumber;
  return Math.sqrt(Math.abs((layers.wallSideDensity - layers.outerDensity) * layers.normalGravity) / layers.interfacialTension);
}

/** Decades either side of the reference wavenumber covered by the scans. */
const SCAN_DECADES = 3;
/** Grid points of the coarse scans (20 per decade). */
const SCAN_POINTS = 121;

export interface WavenumberExtremum {
  /** k at the extremum, rad/m (0 when the extremum lies at k → 0). */
  wavenumber: number;
  /** The extremal value, in the unit of the quantity extremised (m/s for speeds, 1/s for growth rates). */
  value: number;
}

function minimiseOverWavenumber(layers: TwoLayerInterface, f: (k: number) => number): WavenumberExtremum {
  const reference = referenceWavenumber(layers);
  if (!(reference > 0)) return { wavenumber: 0, value: f(0) };
  const lo = Math.log(reference) - SCAN_DECADES * Math.LN10;
  const hi = Math.log(reference) + SCAN_DECADES * Math.LN10;
  const best = scanAndRefineMinimum((s) => f(Math.exp(s)), lo, hi, { gridPoints: SCAN_POINTS, xTolerance: 1e-10 });
  return { wavenumber: Math.exp(best.x), value: best.value };
}

/**
 * Critical velocity difference ΔU_c = min_k ΔU_n(k), and the wavenumber
 * where it occurs (coarse scan over six decades of k around π/w, then
 * golden-section refinement in log k).
 *
 * Unconfined deep layers with gravity (m = 0, h → ∞; Lamb 1932 §268,
 * Chandrasekhar 1961 ch. XI): ΔU_n² = ((ρ₁ + ρ₂)/(ρ₁ρ₂))(Δρ g/k + γk) is
 * least at k = √(Δρ g/γ), where Δρ g/k + γk = 2√(Δρ g γ), so
 *   ΔU_c⁴ = 4 g γ Δρ (ρ₁ + ρ₂)²/(ρ₁² ρ₂²)
 * (about 6.5 m/s for air over water).
 *
 * Confined deep layers without gravity (m = π/w, h → ∞, g = 0):
 * ΔU_n² = ((ρ₁ + ρ₂)/(ρ₁ρ₂)) γ K³/k². With f(k) = (k² + m²)^(3/2)/k²,
 * d ln f/dk = 3k/(k² + m²) − 2/k = 0 gives k² = 2m², i.e. k* = √2 π/w,
 * K*² = 3m², f(k*) = (3m²)^(3/2)/(2m²) = (3√3/2) m, hence
 *   ΔU_c² = ((ρ₁ + ρ₂)/(ρ₁ρ₂)) (3√3π/2) γ/w
 * (see {@link confinedCriticalVelocityDifference}).
 *
 * Returns 0 when the interface is statically unstable (some K with R ≤ 0).
 */
export function criticalVelocityDifference(layers: TwoLayerInterface): WavenumberExtremum {
  return minimiseOverWavenumber(layers, (k) => neutralVelocityDifference(layers, k));
}

/**
 * Closed form for deep layers without gravity, derived in
 * {@link criticalVelocityDifference}:
 * ΔU_c = √( ((ρ₁ + ρ₂)/(ρ₁ρ₂)) (3√3π/2) γ/w ), at k* = √2 π/w.
 * @param densityA ρ₁, kg/m³ (> 0). @param densityB ρ₂, kg/m³ (> 0).
 * @param interfacialTension γ, N/m. @param grooveWidth w, m.
 * @returns { velocityDifference (m/s), wavenumber k* (rad/m) }.
 */
export function confinedCriticalVelocityDifference(
  densityA: number,
  densityB: number,
  interfacialTension: number,
  grooveWidth: number,
): { velocityDifference: number; wavenumber: number } {
  const velocityDifference = Math.sqrt(
    ((densityA + densityB) / (densityA * densityB)) * ((3 * Math.sqrt(3) * Math.PI) / 2) * (interfacialTension / grooveWidth),
  );
  return { velocityDifference, wavenumber: (Math.SQRT2 * Math.PI) / grooveWidth };
}

/**
 * Slowest wave the interface carries at rest: c_min = min_k c(k) with c(k)
 * from {@link intrinsicPhaseSpeed}. For an unconfined deep water surface
 * under a much lighter fluid this is the gravity–capillary minimum
 * c_min⁴ = 4gγΔρ/(ρ₁ + ρ₂)² → 4gγ/ρ (Lamb 1932 §267), about 23 cm/s at
 * λ ≈ 1.7 cm. Returns 0 when the interface is statically unstable.
 */
export function slowestWaveSpeed(layers: TwoLayerInterface): WavenumberExtremum {
  return minimiseOverWavenumber(layers, (k) => intrinsicPhaseSpeed(layers, k));
}

/**
 * Largest growth rate σ_max (1/s) of {@link interfaceGrowthRate} over k, and
 * the k (rad/m) where it occurs (scan over six decades around the reference
 * wavenumber, golden-section refinement); value 0 and wavenumber 0 when
 * every mode is stable.
 */
export function fastestGrowingMode(layers: TwoLayerInterface): WavenumberExtremum {
  const best = minimiseOverWavenumber(layers, (k) => -interfaceGrowthRate(layers, k));
  return best.value < 0 ? { wavenumber: best.wavenumber, value: -best.value } : { wavenumber: 0, value: 0 };
}
