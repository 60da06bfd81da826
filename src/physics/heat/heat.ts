/**
 * Heat-transfer change of a liquid-infused grooved wall against the same wall
 * with its grooves filled by the solid: apparent thermal slip length, laminar
 * fully developed Nusselt numbers with velocity and thermal slip (closed forms,
 * shooting eigenproblem, and a cross-section field solution), and a
 * low-confidence turbulent estimate from Gnielinski's correlation and shifted
 * log laws.
 *
 * Symbols: texture period P, groove width w, depth d, interface fraction
 * φ = w/P, substrate thickness s below the groove floor; conductivities k_w
 * (working liquid), k_o (lubricant), k_s (solid); velocity slip length b,
 * thermal slip length b_t (an equivalent thickness of working liquid: the
 * extra conduction resistance of the liquid-infused wall over the solid-filled
 * wall is b_t/k_w; positive = added resistance, negative = enhancement).
 * Channel full height H (between the planes of the ridge tops), hydraulic
 * diameter D_h = 2H; pipe diameter D = 2R.
 *
 * The pieces, one file each: ./thermal-slip.ts (closed-form thermal slip),
 * ./thermal-core.ts (exact thermal slip at closed-form cost, the default),
 * ./laminar.ts (laminar Nusselt numbers with slip), ./turbulent.ts (turbulent
 * correlations and the log-law estimate), ./conduction-field.ts (conduction
 * cell and cross-section field solution), ./ducts.ts (rectangular-duct
 * validation). Full citations under the keys named in src/core/references.ts.
 */
import { DomainError, requirePositive } from '../../core/errors.js';
import { Notes, outcome, type Outcome } from '../../core/notes.js';
import type { SourcedNumber } from '../../core/values.js';
import { REFERENCES } from '../../core/references.js';
import type { Scenario } from '../scenario.js';
import { solveHeatCrossSection, thermalSlipField, type LubricantMotion, type WallCell } from './conduction-field.js';
import { thermalGrooveSlip } from './thermal-core.js';
import { laminarFrictionRatio, laminarNusselt, type LaminarConfiguration } from './laminar.js';
import { conductivitySweep, type HeatSensitivity } from './sensitivity.js';
import { thermalSlipLubricantGrooves, type ThermalSlipClosedForm } from './thermal-slip.js';
import type { ModelId } from '../../core/models.js';
import { turbulentHeatTransfer } from './turbulent.js';

const CLOSED_FORM_MODEL: Record<ThermalSlipClosedForm['model'], ModelId> = {
  'isothermal-ridges-striped': 'heat.thermal-slip-striped',
  'laminate-bounds-mean': 'heat.thermal-slip-laminate-bounds',
  'identical-materials': 'heat.thermal-slip-identical-materials',
};

/** Narrowest groove (w/P) the exact thermal core is run for (its cost grows like (P/w)³). */
const THERMAL_CORE_LOWEST_FRACTION = 0.02;

/** Largest sensitivity sweep run with the field thermal slip (cost: one conduction solve per point). */
const FIELD_SWEEP_LIMIT = 25;

export type HeatingCondition = 'uniform-flux' | 'uniform-temperature';
/**
 * 'auto' (default) and 'exact-core': thermal slip from the exact core (./thermal-core.ts) with the closed-form or
 * eigenproblem Nu; 'closed-form': the textbook thermal slip; 'field': the cross-section field solution where it
 * applies, else the conduction-cell field solver's thermal slip (the independent references).
 */
export type HeatMethod = 'auto' | 'exact-core' | 'closed-form' | 'field';

export interface HeatInput {
  /** Fluids must carry thermalConductivity and specificHeat. Channel or pipe flow. */
  scenario: Scenario;
  solid: { thermalConductivity: number; substrateThickness: number };
  heating: HeatingCondition;
  /** Channel only; ignored for a pipe. */
  heatedWalls: 'one' | 'both';
  lubricantMotion: LubricantMotion;
  method: HeatMethod;
  /** From the slip model: longitudinal slip length b (m), turbulent velocity shift ΔU⁺ and drag reduction. */
  slip: { slipLengthLongitudinal: number; deltaUPlus?: number; dragReduction?: number };
  /** Sweep of the lubricant conductivity (points ≥ 2, at most 101). */
  sensitivity?: { points: number };
}

export interface HeatResult {
  /** b_t, m (positive = added resistance), from the method used. */
  thermalSlipLength: number;
  /** b_t of the closed form, m (always computed). */
  thermalSlipLengthClosedForm: number;
  /** Velocity slip length used, m (field: from the cross-section solution; else from the slip model). */
  slipLength: number;
  /** Nu on D_h = 2H (channel) or D (pipe), wall temperature at the ridge-top plane of the solid-filled wall; null if undefined. */
  nusselt: number | null;
  /** Nu of the solid-filled, no-slip wall at the same flow rate and heating. */
  nusseltSmooth: number;
  /**
   * Nusselt-number ratio Nu/Nu₀ on the ridge-top plane: the fluid-side film alone, without the wall's own
   * conduction; null if Nu is undefined (thermal slip so negative that the apparent resistance vanishes).
   */
  nusseltRatio: number | null;
  /**
   * The headline: q/q₀, the heat delivered per unit wall area at the same temperature difference between the
   * heated substrate bottom and the bulk liquid, against the solid-filled wall (= U/U₀; wall conduction included).
   */
  heatFluxRatio: number;
  /** Fluid-side heat-transfer coefficient h = Nu k_w/D_h, W/(m²·K); null where Nu is undefined. */
  heatTransferCoefficient: number | null;
  /** h₀ of the solid-filled, no-slip wall, W/(m²·K). */
  heatTransferCoefficientSmooth: number;
  /** Overall coefficient U from the substrate bottom to the bulk, W/(m²·K): q = U ΔT. */
  overallHeatTransferCoefficient: number;
  /** U₀ of the solid-filled wall, W/(m²·K). */
  overallHeatTransferCoefficientSmooth: number;
  /** Reynolds number on the hydraulic diameter (2H channel, D pipe). */
  reynoldsNumber: number;
  /** Friction (pressure drop) ratio at the same flow rate. */
  frictionRatio: number;
  /** Pressure drop per unit length at this flow rate, Pa/m (frictionRatio × the smooth value). */
  pressureGradient: number;
  /** Pressure drop per unit length of the smooth channel or pipe, Pa/m: 2τ_w/H (channel), 4τ_w/D (pipe). */
  pressureGradientSmooth: number;
  /** Fanning f·Re on D_h (laminar), else null. */
  frictionFactorReynolds: number | null;
  /**
   * 'exact-core': b_t from the exact thermal core with the closed-form or eigenproblem Nu (the default);
   * 'field': cross-section solution; 'field-thermal-slip': conduction-cell field b_t with the closed-form
   * or eigenproblem Nu (pipe, uniform temperature, oblique grooves or turbulent flow); 'closed-form'.
   */
  method: 'exact-core' | 'closed-form' | 'field' | 'field-thermal-slip';
  /** (Nu_closed − Nu_field)/Nu_field, measured where the cross-section field method ran; null otherwise. */
  closedFormError: { nusselt: SourcedNumber<'measured'> } | null;
  regime: 'laminar' | 'turbulent';
  confidence: 'normal' | 'low';
  /** Groove Péclet number u_i w/α_o of the lubricant (u_i = slip velocity). */
  groovePecletNumber: number;
  sensitivity?: HeatSensitivity;
}

/** What each branch (turbulent, field cross-section, laminar closed forms) determines; the rest follows from it. */
type HeatCore = Omit<
  HeatResult,
  | 'heatTransferCoefficient'
  | 'heatTransferCoefficientSmooth'
  | 'overallHeatTransferCoefficient'
  | 'overallHeatTransferCoefficientSmooth'
  | 'reynoldsNumber'
  | 'pressureGradient'
  | 'pressureGradientSmooth'
>;

function fluidProperty(value: number | undefined, field: string): number {
  if (value === undefined) throw new DomainError(`${field} is required for heat transfer`, { field, code: 'missing-property' });
  requirePositive(value, field);
  return value;
}

/**
 * Heat-transfer change of the liquid-infused wall against the same wall with
 * its grooves filled by the solid, at the same flow rate.
 *
 * Laminar: Nu from the closed forms ({@link nusseltUniformFluxPlates},
 * {@link nusseltUniformFluxOneWall}, {@link nusseltUniformFluxTube}) or the
 * eigenproblem ({@link nusseltUniformTemperature}) with the slip model's b and
 * the thermal slip b_t; the field method ({@link solveHeatCrossSection}) for
 * channels with grooves along the flow and uniform flux. Turbulent: the
 * low-confidence log-law estimate ({@link turbulentHeatTransfer}).
 * The overall conductance ratio adds the wall's own resistance (s + d)/k_s:
 * 1/U = (s + d)/k_s + D_h/(k_w Nu) (the solid-filled reference with Nu_smooth).
 * `auto` (= `exact-core`) takes b_t from the exact thermal core (docs/slip-core.md:
 * within 3e-3 over the measured range, 0.4 ms typical, up to 90 ms at w/P = 0.02;
 * outside that range it still answers, with a caution); `field` runs the
 * cross-section field method wherever it applies (and reports the closed form's
 * error against it), else the closed forms with the conduction-cell field b_t.
 * Throws DomainError for missing or non-physical properties and geometry
 * (field named), and for flows other than channel or pipe.
 */
export function evaluateHeat(input: HeatInput): Outcome<HeatResult> {
  const notes = new Notes();
  const { scenario, solid } = input;
  const { texture, flow } = scenario;
  const kW = fluidProperty(scenario.workingFluid.thermalConductivity, 'scenario.workingFluid.thermalConductivity');
  const cW = fluidProperty(scenario.workingFluid.specificHeat, 'scenario.workingFluid.specificHeat');
  const kO = fluidProperty(scenario.lubricant.thermalConductivity, 'scenario.lubricant.thermalConductivity');
  const cO = fluidProperty(scenario.lubricant.specificHeat, 'scenario.lubricant.specificHeat');
  requirePositive(scenario.workingFluid.density, 'scenario.workingFluid.density');
  requirePositive(scenario.lubricant.density, 'scenario.lubricant.density');
  requirePositive(scenario.workingFluid.viscosity, 'scenario.workingFluid.viscosity');
  requirePositive(scenario.lubricant.viscosity, 'scenario.lubricant.viscosity');
  const kS = solid.thermalConductivity;
  requirePositive(kS, 'solid.thermalConductivity');
  if (!(Number.isFinite(solid.substrateThickness) && solid.substrateThickness >= 0)) {
    throw new DomainError('substrate thickness must be a non-negative finite length', { field: 'solid.substrateThickness' });
  }
  requirePositive(texture.pitch, 'scenario.texture.pitch');
  requirePositive(texture.grooveWidth, 'scenario.texture.grooveWidth');
  requirePositive(texture.grooveDepth, 'scenario.texture.grooveDepth');
  if (!(texture.grooveWidth < texture.pitch)) {
    throw new DomainError('groove width must be smaller than the pitch', { field: 'scenario.texture.grooveWidth' });
  }
  const slip = input.slip.slipLengthLongitudinal;
  if (!(Number.isFinite(slip) && slip >= 0)) {
    throw new DomainError('slip length must be a non-negative finite length', { field: 'slip.slipLengthLongitudinal' });
  }
  let config: LaminarConfiguration;
  if (flow.kind === 'channel') {
    const H = flow.height;
    if (H === undefined) throw new DomainError('channel height is required', { field: 'scenario.flow.height' });
    requirePositive(H, 'scenario.flow.height');
    config = { geometry: input.heatedWalls === 'both' ? 'plates-both' : 'one-wall', ratioLength: H, hydraulicDiameter: 2 * H, pipe: false };
    const textured = flow.texturedWalls ?? 2;
    if (input.heatedWalls === 'both' && textured === 1) {
      notes.warn('asymmetric-walls', 'Both walls heated but only one textured: computed as if both walls carried the texture (overstates the change).', 'caution');
    }
    if (input.heatedWalls === 'one' && textured === 2) {
      notes.warn('adiabatic-wall-textured', 'The adiabatic opposite wall is treated as smooth and no-slip.', 'info');
    }
  } else if (flow.kind === 'pipe') {
    const D = flow.diameter;
    if (D === undefined) throw new DomainError('pipe diameter is required', { field: 'scenario.flow.diameter' });
    requirePositive(D, 'scenario.flow.diameter');
    config = { geometry: 'tube', ratioLength: D / 2, hydraulicDiameter: D, pipe: true };
  } else {
    throw new DomainError('heat transfer is computed for channel and pipe flows only', { field: 'scenario.flow.kind', code: 'unsupported-flow' });
  }
  notes.cite(REFERENCES.shahLondon1978, REFERENCES.philip1972, REFERENCES.belyaevVinogradova2010);
  notes.assume('Flat lubricant–liquid interface; fully developed flow and heat transfer; constant properties.');
  notes.assume('Reference: the same wall with its grooves filled by the solid, at the same flow rate and heating.');

  const wall: WallCell = {
    pitch: texture.pitch,
    grooveWidth: texture.grooveWidth,
    grooveDepth: texture.grooveDepth,
    substrateThickness: solid.substrateThickness,
    workingConductivity: kW,
    lubricantConductivity: kO,
    solidConductivity: kS,
  };
  const closedForm = (k: number) => thermalSlipLubricantGrooves(texture.pitch, texture.grooveWidth, texture.grooveDepth, kW, k, kS);
  const closed = closedForm(kO);
  notes.model(CLOSED_FORM_MODEL[closed.model]);
  if (closed.model === 'laminate-bounds-mean') notes.cite(REFERENCES.wiener1912);

  const turbulent = flow.regime !== 'laminar';
  const longitudinal = Math.abs(texture.flowAngle) < 1e-9;
  const fieldApplies = !turbulent && !config.pipe && input.heating === 'uniform-flux' && longitudinal;
  if (input.method === 'field' && !fieldApplies) {
    notes.warn(
      'field-not-applicable',
      'The cross-section field method covers laminar channels with grooves along the flow and uniform heat flux; the conduction-cell thermal slip is used with the closed forms instead.',
      'caution',
    );
  }
  // The thermal core's layer modes span the period, so its cost grows like (P/w)³: run from w/P = 0.02 (about
  // 0.1 s there) up; narrower grooves get the closed form with a caution.
  const coreReaches = texture.grooveWidth / texture.pitch >= THERMAL_CORE_LOWEST_FRACTION;
  const useCore = (input.method === 'auto' || input.method === 'exact-core') && coreReaches;
  if ((input.method === 'auto' || input.method === 'exact-core') && !coreReaches) {
    notes.warn(
      'exact-core-out-of-reach',
      `w/P = ${(texture.grooveWidth / texture.pitch).toPrecision(3)} is below ${THERMAL_CORE_LOWEST_FRACTION}, where the exact thermal core is run: the closed-form thermal slip is reported (method 'field' solves the conduction cell).`,
      'caution',
    );
  }
  const useFieldThermalSlip = input.method === 'field';
  const useCrossSection = input.method === 'field' && fieldApplies;
  const fieldThermalSlip = (k: number) => thermalSlipField({ ...wall, lubricantConductivity: k }).thermalSlipLength;
  const coreThermalSlip = (k: number) => thermalGrooveSlip({ ...wall, lubricantConductivity: k });
  let thermalSlip = closed.thermalSlipLength;
  if (useCore) {
    const core = coreThermalSlip(kO);
    thermalSlip = core.thermalSlipLength;
    notes.model('heat.thermal-slip-exact-core').cite(REFERENCES.richardson1911);
    for (const caution of core.warnings) notes.warn(caution.code, caution.message, caution.severity);
  } else if (useFieldThermalSlip) {
    thermalSlip = fieldThermalSlip(kO);
    notes.cite(REFERENCES.patankar1980).model('heat.thermal-slip-field');
  } else if (closed.estimate) {
    notes.warn('thermal-slip-estimate', 'The closed-form thermal slip is exact only for a solid much more conductive than both liquids; the default method gives the exact value.', 'caution');
  }
  const thermalSlipMethod: HeatResult['method'] = useCore ? 'exact-core' : useFieldThermalSlip ? 'field-thermal-slip' : 'closed-form';

  const wallResistance = (solid.substrateThickness + texture.grooveDepth) / kS;
  const Dh = config.hydraulicDiameter;
  const overallFrom = (nusseltSlip: number | null, bt: number, smooth: number): number => {
    // 1/U = R_wall + D_h/(k_w Nu_slip) + b_t/k_w against 1/U₀ = R_wall + D_h/(k_w Nu₀).
    const reference = wallResistance + Dh / (kW * smooth);
    const own = nusseltSlip === null ? Number.NaN : wallResistance + Dh / (kW * nusseltSlip) + bt / kW;
    return own > 0 ? reference / own : Number.NaN;
  };

  let result: HeatCore;
  // Filled in once the slip length in use is known (the field method computes its own).
  const groovePecletNumber = 0;

  if (turbulent) {
    notes.cite(REFERENCES.gnielinski1976, REFERENCES.petukhov1970, REFERENCES.kader1981).model('heat.turbulent-log-law-shift');
    notes.warn('turbulent-estimate', 'Turbulent heat-transfer change is a low-confidence estimate from shifted velocity and temperature log laws.', 'caution');
    if (flow.regime === 'transitional') notes.warn('transitional-flow', 'Transitional flow: neither the laminar nor the turbulent result is reliable.', 'warning');
    const reH = flow.reynoldsNumber;
    if (reH === undefined) throw new DomainError('Reynolds number is required for turbulent flow', { field: 'scenario.flow.reynoldsNumber' });
    const reynolds = config.pipe ? reH : 2 * reH; // channel Re is on H; Gnielinski takes D_h = 2H
    if (reynolds < 3000 || reynolds > 5e6) notes.warn('gnielinski-range', `Re_Dh = ${reynolds.toPrecision(3)} outside 3e3–5e6 of Gnielinski (1976).`, 'caution');
    const prandtl = (scenario.workingFluid.viscosity * cW) / kW;
    const estimate = turbulentHeatTransfer({
      reynolds,
      prandtl,
      viscousLength: flow.viscousLength,
      thermalSlipLength: thermalSlip,
      deltaUPlus: input.slip.deltaUPlus,
      dragReduction: input.slip.dragReduction,
    });
    if (!config.pipe) notes.assume('Channel treated with the pipe correlations on the hydraulic diameter 2H (Gnielinski 1976).');
    const smooth = estimate.nusseltSmooth;
    const ownResistance = wallResistance + Dh / (kW * estimate.nusselt);
    result = {
      thermalSlipLength: thermalSlip,
      thermalSlipLengthClosedForm: closed.thermalSlipLength,
      slipLength: slip,
      nusselt: estimate.nusselt,
      nusseltSmooth: smooth,
      nusseltRatio: estimate.nusseltRatio,
      heatFluxRatio: (wallResistance + Dh / (kW * smooth)) / ownResistance,
      frictionRatio: estimate.frictionRatio,
      frictionFactorReynolds: null,
      method: thermalSlipMethod,
      closedFormError: null,
      regime: 'turbulent',
      confidence: 'low',
      groovePecletNumber,
    };
  } else {
    const smooth = laminarNusselt(config, input.heating, 0, 0) as number;
    const closedNusselt = laminarNusselt(config, input.heating, slip, closed.thermalSlipLength);
    if (useCrossSection) {
      const section = solveHeatCrossSection({
        wall,
        height: config.ratioLength,
        heatedWalls: input.heatedWalls,
        workingViscosity: scenario.workingFluid.viscosity,
        lubricantViscosity: scenario.lubricant.viscosity,
        workingHeatCapacity: scenario.workingFluid.density * cW,
        lubricantHeatCapacity: scenario.lubricant.density * cO,
        lubricantMotion: input.lubricantMotion,
      });
      notes.model('heat.cross-section-field');
      const smoothOverall = Dh / kW / (wallResistance + Dh / (kW * smooth));
      result = {
        thermalSlipLength: thermalSlip,
        thermalSlipLengthClosedForm: closed.thermalSlipLength,
        slipLength: section.slipLength,
        nusselt: section.nusselt,
        nusseltSmooth: smooth,
        nusseltRatio: section.nusselt === null ? null : section.nusselt / smooth,
        heatFluxRatio: section.overallNusselt / smoothOverall,
        frictionRatio: 1 / section.flowRateRatio,
        frictionFactorReynolds: section.frictionFactorReynolds,
        method: 'field',
        closedFormError:
          section.nusselt !== null && closedNusselt !== null
            ? { nusselt: { value: (closedNusselt - section.nusselt) / section.nusselt, source: 'measured' } }
            : null,
        regime: 'laminar',
        confidence: 'normal',
        groovePecletNumber,
      };
    } else {
      const nusselt = laminarNusselt(config, input.heating, slip, thermalSlip);
      const nusseltSlip = laminarNusselt(config, input.heating, slip, 0);
      const frictionRatio = laminarFrictionRatio(config, slip);
      notes.model('heat.laminar-closed-form');
      result = {
        thermalSlipLength: thermalSlip,
        thermalSlipLengthClosedForm: closed.thermalSlipLength,
        slipLength: slip,
        nusselt,
        nusseltSmooth: smooth,
        nusseltRatio: nusselt === null ? null : nusselt / smooth,
        heatFluxRatio: overallFrom(nusseltSlip, thermalSlip, smooth),
        frictionRatio,
        frictionFactorReynolds: (config.pipe ? 16 : 24) * frictionRatio, // Fanning f·Re: 16 tube, 24 plates (Shah & London 1978)
        method: thermalSlipMethod,
        closedFormError: null,
        regime: 'laminar',
        confidence: 'normal',
        groovePecletNumber,
      };
      if (input.heating === 'uniform-temperature') notes.model('heat.uniform-temperature-shooting');
      if (input.heating === 'uniform-temperature' && thermalSlip !== 0) {
        notes.assume('Uniform wall temperature with thermal slip: the Robin condition T_f = T_w − b_t ∂T/∂n on the homogenised wall.');
      }
    }
  }
  if (result.nusselt === null) {
    notes.warn(
      'apparent-nusselt-undefined',
      'The lubricant removes more conduction resistance than the fluid-side film adds: the apparent Nu on the reference wall plane is undefined; use heatFluxRatio.',
      'warning',
    );
  }
  if (!Number.isFinite(result.heatFluxRatio)) {
    throw new DomainError('thermal slip length makes the total thermal resistance non-positive', { field: 'solid.thermalConductivity' });
  }

  // Interface (slip) velocity u_i = τ_w b/μ_w carries lubricant across the groove width w.
  const slipVelocity = (flow.wallShearStress * result.slipLength) / scenario.workingFluid.viscosity;
  const lubricantDiffusivity = kO / (scenario.lubricant.density * cO);
  result.groovePecletNumber = (slipVelocity * texture.grooveWidth) / lubricantDiffusivity;
  // Where conduction-only homogenisation is not enough (thresholds common practice, no source).
  const comparableSolid = kS < 10 * Math.max(kW, kO);
  if (result.groovePecletNumber > 1 && comparableSolid) {
    notes.warn(
      'lubricant-advection',
      `Groove Péclet number ${result.groovePecletNumber.toPrecision(3)} > 1 with a solid not much more conductive than the liquids: recirculating lubricant carries heat that the thermal slip length ignores.`,
      'caution',
    );
  }
  const channelScale = config.pipe ? config.hydraulicDiameter : config.ratioLength;
  if (texture.pitch > 0.1 * channelScale) {
    notes.warn('pitch-not-small', `Pitch is ${(texture.pitch / channelScale).toPrecision(2)} of the channel height/diameter: homogenised slip lengths lose accuracy.`, 'caution');
  }

  if (input.sensitivity !== undefined) {
    // Each field point is one conduction-cell solve (~0.1–0.5 s): long field sweeps fall back to the closed form.
    // The exact core costs about 0.4 ms a point (up to 90 ms for the narrowest grooves), so it sweeps every point.
    const sweepField = useFieldThermalSlip && input.sensitivity.points <= FIELD_SWEEP_LIMIT;
    if (useFieldThermalSlip && !sweepField) {
      notes.warn('sensitivity-closed-form', `More than ${FIELD_SWEEP_LIMIT} sweep points: the sweep uses the closed-form thermal slip.`, 'info');
    }
    const laminarConfig = turbulent ? null : config;
    const ratiosAt = (bt: number): { nusseltRatio: number | null; heatFluxRatio: number | null } => {
      if (laminarConfig !== null) {
        const nu = laminarNusselt(laminarConfig, input.heating, result.slipLength, bt);
        const o = overallFrom(laminarNusselt(laminarConfig, input.heating, result.slipLength, 0), bt, result.nusseltSmooth);
        return { nusseltRatio: nu === null ? null : nu / result.nusseltSmooth, heatFluxRatio: Number.isFinite(o) ? o : null };
      }
      try {
        const e = turbulentHeatTransfer({
          reynolds: config.pipe ? (flow.reynoldsNumber as number) : 2 * (flow.reynoldsNumber as number),
          prandtl: (scenario.workingFluid.viscosity * cW) / kW,
          viscousLength: flow.viscousLength,
          thermalSlipLength: bt,
          deltaUPlus: input.slip.deltaUPlus,
          dragReduction: input.slip.dragReduction,
        });
        return { nusseltRatio: e.nusseltRatio, heatFluxRatio: (wallResistance + Dh / (kW * e.nusseltSmooth)) / (wallResistance + Dh / (kW * e.nusselt)) };
      } catch {
        return { nusseltRatio: null, heatFluxRatio: null };
      }
    };
    result.sensitivity = conductivitySweep({
      points: input.sensitivity.points,
      low: 0.1 * Math.min(kW, kO, kS),
      high: 10 * Math.max(kW, kO, kS),
      thermalSlip: (k) => (useCore ? coreThermalSlip(k).thermalSlipLength : sweepField ? fieldThermalSlip(k) : closedForm(k).thermalSlipLength),
      ratiosAt,
      thermalSlipMethod: useCore ? 'exact-core' : sweepField ? 'field' : 'closed-form',
    });
    if (result.sensitivity.bestLubricantConductivity === result.sensitivity.lubricantConductivity[input.sensitivity.points - 1]) {
      notes.warn('sensitivity-at-range-edge', 'Heat transfer keeps rising with lubricant conductivity across the sweep: the best value is its upper end.', 'info');
    }
    if (!sweepField || !useCrossSection) notes.assume('The sensitivity sweep keeps the velocity slip fixed and varies only the thermal slip.');
  }
  // Coefficients, Reynolds number and pressure drop follow from the ratios and the smooth reference.
  const smoothOverall = 1 / (wallResistance + Dh / (kW * result.nusseltSmooth));
  const reynoldsNumber = (flow.bulkVelocity ?? 0) * Dh * (scenario.workingFluid.density / scenario.workingFluid.viscosity);
  const pressureGradientSmooth = ((config.pipe ? 4 : 2) * flow.wallShearStress) / (config.pipe ? config.hydraulicDiameter : config.ratioLength);
  return outcome(
    {
      ...result,
      heatTransferCoefficient: result.nusselt === null ? null : (result.nusselt * kW) / Dh,
      heatTransferCoefficientSmooth: (result.nusseltSmooth * kW) / Dh,
      overallHeatTransferCoefficient: result.heatFluxRatio * smoothOverall,
      overallHeatTransferCoefficientSmooth: smoothOverall,
      reynoldsNumber,
      pressureGradient: result.frictionRatio * pressureGradientSmooth,
      pressureGradientSmooth,
    },
    notes,
  );
}
