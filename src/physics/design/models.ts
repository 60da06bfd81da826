/**
 * The model registry: every id a result can list in `provenance.models`
 * (src/core/models.ts) mapped to the function that implements it and the
 * references it rests on. `satisfies Record<ModelId, …>` makes the compiler
 * refuse an id without an entry; a test checks that the ids the calculations
 * emit are registered and that every reference key exists.
 */
import type { ModelId } from '../../core/models.js';
import type { ReferenceKey } from '../../core/references.js';
import { blasiusSkinFriction, colebrookFrictionFactor, deanSkinFriction, evaluateFlow, laminarChannelSkinFriction, turbulentPlateSkinFriction } from '../flow/flow.js';
import { solveLongitudinalCell } from '../groove/groove-cell.js';
import { solveHeatCrossSection, thermalSlipField } from '../heat/conduction-field.js';
import { nusseltUniformFluxPlates, nusseltUniformTemperature } from '../heat/laminar.js';
import { stripedThermalSlip, thermalSlipLubricantGrooves } from '../heat/thermal-slip.js';
import { turbulentHeatTransfer } from '../heat/turbulent.js';
import { dissolutionLifetime } from '../retention/dissolution.js';
import { lumpedRetainedLength, solveDrainage } from '../retention/drainage.js';
import { holdLengths } from '../retention/holding.js';
import { laminarChannelDragReductionBothWalls, laminarPipeDragReduction, turbulentDragChange, virtualOriginShift } from '../slip/drag.js';
import { belyaevVinogradovaSlipLengthLongitudinal } from '../slip/stripe-slip.js';
import { cleanTransverseCoefficients, marangoniScaling, philipTransverse } from '../surfactant/scaling.js';
import { solveLongWaveGroove, solveTransverseInterface } from '../surfactant/solver.js';
import { evaluateCriteria } from '../waves/criteria.js';
import { criticalVelocityDifference, slowestWaveSpeed } from '../waves/dispersion.js';
import { evaluateWetting } from '../wetting/wetting.js';

export interface ModelEntry {
  /** What the model computes, in a sentence. */
  summary: string;
  /** The function that implements it (the smallest one that carries the formula or the solve). */
  implementation: (...args: never[]) => unknown;
  /** Keys in src/core/references.ts. */
  references: readonly ReferenceKey[];
}

export const MODELS = {
  'flow.channel-laminar': {
    summary: 'Laminar plane Poiseuille flow: C_f = 12/Re_m on the full height.',
    implementation: laminarChannelSkinFriction,
    references: ['white2006'],
  },
  'flow.channel-turbulent-dean': {
    summary: "Dean's turbulent plane-channel correlation C_f = 0.073 Re_m^(−1/4).",
    implementation: deanSkinFriction,
    references: ['dean1978'],
  },
  'flow.pipe-laminar': { summary: 'Laminar Hagen–Poiseuille pipe flow: f_D = 64/Re.', implementation: evaluateFlow, references: ['white2006'] },
  'flow.pipe-turbulent-colebrook': {
    summary: 'Colebrook equation solved to machine precision from the Haaland start.',
    implementation: colebrookFrictionFactor,
    references: ['colebrook1939', 'haaland1983'],
  },
  'flow.plate-laminar-blasius': {
    summary: 'Blasius laminar boundary layer: local c_f = 0.664 Re_x^(−1/2).',
    implementation: blasiusSkinFriction,
    references: ['blasius1908', 'schlichting2017'],
  },
  'flow.plate-turbulent-power-law': {
    summary: 'Turbulent flat plate, c_f = 0.0592 Re_x^(−1/5).',
    implementation: turbulentPlateSkinFriction,
    references: ['schlichting2017'],
  },
  'flow.plate-turbulent-schlichting': {
    summary: "Turbulent flat plate beyond Re_x = 10⁷, Schlichting's (2 log₁₀ Re_x − 0.65)^(−2.3).",
    implementation: turbulentPlateSkinFriction,
    references: ['schlichting2017'],
  },
  'flow.wall-shear-given': { summary: 'Wall shear stress given directly; u_τ and ℓ_ν follow.', implementation: evaluateFlow, references: [] },
  'wetting.three-state-energies': {
    summary: 'Energies of the film-covered, infused and displaced states; hemiwicking critical angle.',
    implementation: evaluateWetting,
    references: ['bico2002', 'smith2013'],
  },
  'retention.holding-mechanisms': {
    summary: 'Capillary back-pressure and contact-line pinning against shear and gravity along the groove.',
    implementation: holdLengths,
    references: ['wexler2015', 'furmidge1962', 'elsherbini2006', 'shahLondon1978', 'white2006'],
  },
  'retention.drainage-finite-volume': {
    summary: 'Filled cross-section along the groove, finite volumes in space and BDF2 in time.',
    implementation: solveDrainage,
    references: ['wexler2015'],
  },
  'retention.drainage-lumped-plug': {
    summary: 'Lumped plug drainage dL/dt = −V_s(1 − L∞/L) in closed form.',
    implementation: lumpedRetainedLength,
    references: ['wexler2015'],
  },
  'retention.dissolution': {
    summary: 'Dissolution lifetime from Lévêque or Shaw–Hanratty mass transfer with a Wilke–Chang diffusivity.',
    implementation: dissolutionLifetime,
    references: ['leveque1928', 'shawHanratty1977', 'wilkeChang1955'],
  },
  'slip.stripe-closed-form': {
    summary: 'Belyaev–Vinogradova stripes with the lubricant-filled groove’s mean local slip; slip tensor for oblique flow.',
    implementation: belyaevVinogradovaSlipLengthLongitudinal,
    references: ['philip1972', 'laugaStone2003', 'belyaevVinogradova2010', 'asmolovVinogradova2012', 'schoenecker2014', 'kamrinBazantStone2010'],
  },
  'slip.groove-cell-field': {
    summary: 'Exact flat-interface groove-cell field solution (finite volumes, longitudinal and transverse).',
    implementation: solveLongitudinalCell,
    references: ['philip1972', 'laugaStone2003', 'patankar1980'],
  },
  'drag.laminar-channel': {
    summary: 'Laminar channel at fixed flow rate with slipping walls.',
    implementation: laminarChannelDragReductionBothWalls,
    references: ['laugaStone2003'],
  },
  'drag.laminar-pipe': { summary: 'Laminar pipe at fixed flow rate with a slipping wall.', implementation: laminarPipeDragReduction, references: ['laugaStone2003'] },
  'drag.turbulent-virtual-origin': {
    summary: 'Virtual-origin shift ΔU⁺ converted to drag reduction at fixed bulk Reynolds number.',
    implementation: turbulentDragChange,
    references: ['fukagata2006', 'ibrahim2021'],
  },
  'drag.turbulent-log-law-shift': {
    summary: 'Virtual-origin shift ΔU⁺ alone (no skin-friction coefficient to convert it).',
    implementation: virtualOriginShift,
    references: ['fukagata2006', 'ibrahim2021'],
  },
  'waves.inertial-capillary-scaling': {
    summary: 'Inertial–capillary number Λ = w⁺ We_τ^(1/3) against the calm/wavy boundary.',
    implementation: evaluateCriteria,
    references: [],
  },
  'waves.confined-kelvin-helmholtz': {
    summary: 'Two-layer Kelvin–Helmholtz stability with capillarity, gravity, finite depths and the pinned spanwise mode.',
    implementation: criticalVelocityDifference,
    references: ['chandrasekhar1961', 'drazinReid1981', 'lamb1932'],
  },
  'waves.critical-layer-screen': {
    summary: 'Whether the mean flow above the sublayer moves with the slowest confined wave.',
    implementation: slowestWaveSpeed,
    references: ['miles1957', 'spalding1961'],
  },
  'waves.static-depinning-rayleigh-taylor': {
    summary: 'Depinning pressure against wall-pressure fluctuations; Rayleigh–Taylor limit of the pinned interface.',
    implementation: evaluateCriteria,
    references: ['farabeeCasarella1991', 'chandrasekhar1961'],
  },
  'surfactant.clean-grating-channel': {
    summary: 'Clean transverse interface velocity of a grating in a channel.',
    implementation: cleanTransverseCoefficients,
    references: ['landel2020'],
  },
  'surfactant.clean-grating-half-space': {
    summary: "Clean transverse interface velocity of a short-period grating (Philip's transverse solution).",
    implementation: philipTransverse,
    references: ['landel2020', 'philip1972'],
  },
  'surfactant.marangoni-scaling': {
    summary: 'Scaling theory of the Marangoni reduction of the interface velocity.',
    implementation: marangoniScaling,
    references: ['landel2020', 'peaudecerf2017'],
  },
  'surfactant.interface-solver': {
    summary: 'Transverse interface solver: half-space Stokes, surface advection–diffusion with kinetic exchange.',
    implementation: solveTransverseInterface,
    references: ['landel2020', 'scharfetter1969'],
  },
  'surfactant.long-wave-groove': {
    summary: 'Long-wave surfactant model along a finite streamwise groove.',
    implementation: solveLongWaveGroove,
    references: ['landel2020'],
  },
  'heat.thermal-slip-striped': {
    summary: 'Thermal slip of isothermal ridges over lubricant-filled grooves (striped homogenisation).',
    implementation: stripedThermalSlip,
    references: ['philip1972', 'belyaevVinogradova2010'],
  },
  'heat.thermal-slip-laminate-bounds': {
    summary: 'Thermal slip of a conductive lubricant: mean of the series and parallel laminate bounds.',
    implementation: thermalSlipLubricantGrooves,
    references: ['wiener1912'],
  },
  'heat.thermal-slip-identical-materials': {
    summary: 'Lubricant and solid of equal conductivity: no thermal slip.',
    implementation: thermalSlipLubricantGrooves,
    references: [],
  },
  'heat.thermal-slip-field': {
    summary: 'Exact conduction on one texture period of the wall (finite volumes).',
    implementation: thermalSlipField,
    references: ['patankar1980'],
  },
  'heat.laminar-closed-form': {
    summary: 'Laminar fully developed Nusselt numbers with velocity and thermal slip, uniform heat flux.',
    implementation: nusseltUniformFluxPlates,
    references: ['shahLondon1978'],
  },
  'heat.uniform-temperature-shooting': {
    summary: 'Laminar Nusselt number at uniform wall temperature by shooting on the Graetz-type eigenproblem.',
    implementation: nusseltUniformTemperature,
    references: ['shahLondon1978'],
  },
  'heat.cross-section-field': {
    summary: 'Laminar flow and heat transfer solved together on the channel cross-section.',
    implementation: solveHeatCrossSection,
    references: ['shahLondon1978', 'patankar1980'],
  },
  'heat.turbulent-log-law-shift': {
    summary: 'Gnielinski smooth-wall Nusselt number with shifted velocity and temperature log laws (low confidence).',
    implementation: turbulentHeatTransfer,
    references: ['gnielinski1976', 'petukhov1970', 'kader1981'],
  },
} as const satisfies Record<ModelId, ModelEntry>;
