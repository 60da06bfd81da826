/**
 * Identifiers of the models a calculation can run, one namespace
 * `<topic>.<model>`. A result's `provenance.models` lists these ids; the
 * registry in src/physics/design/models.ts maps each to the function that
 * implements it and the references it rests on (a test checks both lists
 * agree). Adding a model: add its id here and its entry there.
 */
export const MODEL_IDS = [
  'flow.channel-laminar',
  'flow.channel-turbulent-dean',
  'flow.pipe-laminar',
  'flow.pipe-turbulent-colebrook',
  'flow.plate-laminar-blasius',
  'flow.plate-turbulent-power-law',
  'flow.plate-turbulent-schlichting',
  'flow.wall-shear-given',
  'wetting.three-state-energies',
  'retention.holding-mechanisms',
  'retention.drainage-finite-volume',
  'retention.drainage-lumped-plug',
  'retention.dissolution',
  'slip.stripe-closed-form',
  'slip.groove-cell-exact-core',
  'slip.groove-cell-field',
  'drag.laminar-channel',
  'drag.laminar-pipe',
  'drag.turbulent-virtual-origin',
  'drag.turbulent-log-law-shift',
  'waves.inertial-capillary-scaling',
  'waves.confined-kelvin-helmholtz',
  'waves.critical-layer-screen',
  'waves.static-depinning-rayleigh-taylor',
  'surfactant.clean-grating-channel',
  'surfactant.clean-grating-half-space',
  'surfactant.marangoni-scaling',
  'surfactant.interface-solver',
  'surfactant.long-wave-groove',
  'heat.thermal-slip-striped',
  'heat.thermal-slip-laminate-bounds',
  'heat.thermal-slip-identical-materials',
  'heat.thermal-slip-exact-core',
  'heat.thermal-slip-field',
  'heat.laminar-closed-form',
  'heat.uniform-temperature-shooting',
  'heat.cross-section-field',
  'heat.turbulent-log-law-shift',
] as const;

export type ModelId = (typeof MODEL_IDS)[number];
