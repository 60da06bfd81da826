/** Response of POST /v1/waves. */
import { z } from '../zod.js';
import { envelopeSchema, num, numOrNull } from './common.js';

export const WaveRegimeSchema = z.enum(['calm', 'marginal', 'wavy']);
const criteria = ['inertial-capillary', 'kelvin-helmholtz', 'depinning', 'rayleigh-taylor'] as const;

export const WavesResultSchema = z
  .strictObject({
    scaling: z
      .strictObject({
        viscousLength: num('ℓ_ν = ν/u_τ, m'),
        grooveWidthPlus: num('w⁺ = w/ℓ_ν'),
        grooveDepthPlus: num('d⁺ = d/ℓ_ν'),
        frictionCapillaryNumber: num('We_τ = μ_w u_τ/γ'),
        frictionWeberNumber: num('We_f = ρ_w u_τ² w/γ = w⁺ We_τ'),
        bulkWeberNumber: numOrNull('We_b = ρ_w U_b² w/γ; null without a bulk velocity'),
        inertialCapillaryNumber: num('Λ = w⁺ We_τ^(1/3)'),
        inertialCapillaryBoundary: num('The trade boundary Λ = 1 between calm and wavy; the calm band ends at 2^(−1/12) ≈ 0.944'),
        interfaceSlipVelocity: num('u_s = u_τ² b_∥/ν, m/s'),
      })
      .openapi({ description: 'The wall-unit scaling of the design' }),
    kelvinHelmholtz: z.strictObject({
      growthRateCurve: z.array(z.strictObject({ wavenumber: num('k, rad/m'), growthRate: num('σ, 1/s'), neutralVelocityDifference: num('ΔU at which this k turns unstable, m/s') })),
      mostUnstableWavelength: numOrNull('λ at the largest growth rate, m; null when every mode is stable'),
      maxGrowthRate: num('σ_max, 1/s'),
      maxGrowthRatePlus: num('σ_max ν/u_τ²'),
      criticalVelocityDifference: num('ΔU_c, m/s (0 when the interface is statically unstable)'),
      criticalWavelength: num('2π/k at ΔU_c, m'),
      deepLayerCriticalVelocityDifference: num('Deep-layer, no-gravity closed form, m/s'),
      velocityDifferenceImposed: num('ΔU the flow imposes across the interface at the wave scale, m/s'),
      velocityDifferenceHeight: num('Height where ΔU is read, w/(√3π), m'),
      slowestWaveSpeed: num('c_min, m/s'),
      slowestWaveSpeedPlus: num('c_min⁺ = c_min/u_τ'),
      slowestWaveWavelength: num('m'),
      lubricantDepth: num('h₁, m'),
      outerDepth: numOrNull('h₂, m; null = deep'),
      normalGravity: num('g_⊥, m/s²'),
    }),
    criticalLayer: z.strictObject({
      waveSpeedRelativeToWall: num('u_s + c_min, m/s'),
      criticalHeightPlus: numOrNull('y_c⁺; null when the wave outruns the fastest mean flow'),
      criticalHeight: numOrNull('y_c, m'),
      sublayerEdgePlus: num('y⁺ = 5'),
      largestMeanVelocity: numOrNull('m/s; null if unknown'),
      exists: z.boolean(),
    }),
    staticChecks: z.strictObject({
      depinningPressure: num('2γ/w, Pa'),
      wallPressureFluctuationLow: num('p′_rms, Pa (2.5 ρu_τ²)'),
      wallPressureFluctuationHigh: num('p′_rms, Pa (3.4 ρu_τ²)'),
      depinningRatio: num('p′_rms/(2γ/w)'),
      rayleighTaylor: z.strictObject({
        bondNumber: num('|Δρ g_⊥| w²/γ'),
        criticalBondNumber: num('π²'),
        destabilising: z.boolean(),
        stable: z.boolean(),
        maxGrooveWidth: numOrNull('Widest groove the interface holds against gravity, m'),
      }),
    }),
    loadRatios: z
      .strictObject(Object.fromEntries(criteria.map((c) => [c, z.number()])) as Record<(typeof criteria)[number], z.ZodNumber>)
      .openapi({ description: 'Load ratio Π of each criterion (calm below 2^(−1/4) ≈ 0.841 for all)' }),
    governingCriterion: z.enum(criteria),
    regime: WaveRegimeSchema.openapi({ description: 'calm: every Π < 2^(−1/4) ≈ 0.841 (Λ < 0.944); wavy: Λ > 2^(1/12) ≈ 1.059 or a physical threshold crossed; marginal between' }),
    designLimits: z.strictObject({
      maxGrooveWidth: numOrNull('Widest groove keeping the regime calm, m'),
      maxGrooveWidthPlus: numOrNull('In viscous lengths'),
      minInterfacialTension: numOrNull('Lowest interfacial tension keeping it calm, N/m'),
      maxFrictionVelocity: numOrNull('Highest friction velocity tolerated calm, m/s'),
    }),
    map: z.strictObject({
      frictionCapillaryNumbers: z.array(z.number()),
      grooveWidthsPlus: z.array(z.number()),
      regimes: z.array(z.array(WaveRegimeSchema)),
      boundaryGrooveWidthPlus: z.array(z.number().nullable()).openapi({ description: 'Per column, the w⁺ where the largest load ratio is 1 (the trade boundary Λ = 1 when the scaling governs)' }),
      designPoint: z.strictObject({ frictionCapillaryNumber: z.number(), grooveWidthPlus: z.number() }),
    })
      .optional()
      .openapi({ description: 'Regime over a (We_τ, w⁺) grid with the design point, for plotting (only when asked for: options.map or options.mapResolution)' }),
  })
  .openapi('WavesResult');

export const WavesResponse = envelopeSchema('WavesResponse', WavesResultSchema, true);
