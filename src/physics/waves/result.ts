/** The shape of a wave evaluation (./waves.ts), in SI units unless stated. */
import type { Verdict } from '../../core/values.js';
import type { WaveCriterion, WaveRegime } from './criteria.js';
import type { RegimeMap } from './limits.js';

export interface GrowthRatePoint {
  /** k, rad/m. */
  wavenumber: number;
  /** σ, 1/s. */
  growthRate: number;
  /** ΔU at which this k turns unstable, m/s (the neutral curve; 0 where the interface is statically unstable). */
  neutralVelocityDifference: number;
}

export interface WavesResult {
  /** The wall-unit scaling of the design: sizes in viscous lengths and the dimensionless groups. */
  scaling: {
    /** ℓ_ν = ν/u_τ, m. */
    viscousLength: number;
    /** w⁺ = w/ℓ_ν. */
    grooveWidthPlus: number;
    /** d⁺ = d/ℓ_ν. */
    grooveDepthPlus: number;
    /** We_τ = μ_w u_τ/γ (friction capillary number). */
    frictionCapillaryNumber: number;
    /** We_f = ρ_w u_τ² w/γ = w⁺ We_τ. */
    frictionWeberNumber: number;
    /** We_b = ρ_w U_b² w/γ; null without a bulk velocity. */
    bulkWeberNumber: number | null;
    /** Λ = w⁺ We_τ^(1/3). */
    inertialCapillaryNumber: number;
    /** The trade's calm/wavy boundary Λ = 1 (common practice, no source). */
    inertialCapillaryBoundary: number;
    /** u_s = u_τ² b_∥/ν, m/s. */
    interfaceSlipVelocity: number;
  };
  kelvinHelmholtz: {
    growthRateCurve: GrowthRatePoint[];
    /** λ at the largest growth rate, m; null when every mode is stable. */
    mostUnstableWavelength: number | null;
    /** σ_max, 1/s (0 when stable). */
    maxGrowthRate: number;
    /** σ_max ν/u_τ². */
    maxGrowthRatePlus: number;
    /** ΔU_c, m/s, from the full dispersion relation; 0 when the interface is statically unstable. */
    criticalVelocityDifference: number;
    /** 2π/k at ΔU_c, m (the first wave to grow). */
    criticalWavelength: number;
    /** Deep-layer, no-gravity closed form ΔU_c = √(((ρ₁+ρ₂)/(ρ₁ρ₂))(3√3π/2)γ/w), m/s. */
    deepLayerCriticalVelocityDifference: number;
    /** ΔU across the interface at the wave's scale, m/s. */
    velocityDifferenceImposed: number;
    /** Height above the interface where ΔU is read, y_e = 1/K* = w/(√3π), m. */
    velocityDifferenceHeight: number;
    /** c_min, m/s: slowest confined wave, relative to the (resting) layers. */
    slowestWaveSpeed: number;
    /** c_min⁺ = c_min/u_τ. */
    slowestWaveSpeedPlus: number;
    /** λ of the slowest wave, m. */
    slowestWaveWavelength: number;
    /** Layer depths used: h₁ (groove depth) and h₂ (null = deep). */
    lubricantDepth: number;
    outerDepth: number | null;
    /** g_⊥ used, m/s². */
    normalGravity: number;
  };
  criticalLayer: {
    /** u_s + c_min, m/s: speed of the slowest confined wave relative to the wall. */
    waveSpeedRelativeToWall: number;
    /** y_c⁺ where u⁺(y⁺) − u_s⁺ = c_min⁺; null when the wave outruns the fastest mean flow (no such height). */
    criticalHeightPlus: number | null;
    /** y_c, m; null as above. */
    criticalHeight: number | null;
    /** Sublayer edge used, y⁺ = 5 (common practice, no source). */
    sublayerEdgePlus: number;
    /** Largest mean velocity of the flow (centreline or free stream), m/s; null if unknown (wall-shear input). */
    largestMeanVelocity: number | null;
    /** True when y_c⁺ lies above the sublayer and inside the flow: waves can be fed there. */
    exists: boolean;
  };
  staticChecks: {
    /** 2γ/w, Pa. */
    depinningPressure: number;
    /** p′_rms range, Pa: 2.5 and 3.4 ρu_τ² (PRESSURE_FLUCTUATION_LOW/HIGH in ./criteria.ts); 0 in laminar flow. */
    wallPressureFluctuationLow: number;
    wallPressureFluctuationHigh: number;
    /** p′_rms(high)/(2γ/w). */
    depinningRatio: number;
    rayleighTaylor: {
      /** Bo = |Δρ g_⊥| w²/γ. */
      bondNumber: number;
      /** π²: the pinned fundamental mode's limit (k → 0). */
      criticalBondNumber: number;
      /** True when gravity pulls the denser liquid towards the lighter one. */
      destabilising: boolean;
      stable: boolean;
      /** Widest groove the interface holds against gravity, π√(γ/(|Δρ| g_⊥)), m; null when gravity stabilises. */
      maxGrooveWidth: number | null;
    };
  };
  /** Load ratio of each criterion (see the module comment). */
  loadRatios: Record<WaveCriterion, number>;
  governingCriterion: WaveCriterion;
  regime: WaveRegime;
  /** Passes when calm (./criteria.ts); lifted out of the result by the composition. */
  verdict: Verdict;
  designLimits: {
    /** Widest groove keeping the regime calm at this flow and tension, m; null if none found. */
    maxGrooveWidth: number | null;
    maxGrooveWidthPlus: number | null;
    /** Lowest interfacial tension keeping it calm, N/m. */
    minInterfacialTension: number | null;
    /** Highest friction velocity this design tolerates calm, m/s. */
    maxFrictionVelocity: number | null;
  };
  map: RegimeMap;
}
