/**
 * From validated request parts to the resolved SI shapes the physics takes:
 * catalogue look-up of fluids, flow conditions, texture defaults.
 */
import { checkContinuumScale } from '../physics/continuum.js';
import { Notes } from '../physics/common.js';
import { evaluateFlow, type FlowResult } from '../physics/flow.js';
import type { Scenario, Texture } from '../physics/scenario.js';
import { resolveInterfacialTension } from '../physics/wetting.js';
import type { FluidState } from '../materials/types.js';
import { resolveFluid } from '../materials/index.js';
import { canonicalJson } from './envelope.js';
import type { FlowInput, FluidInput, TextureInput } from './schemas/scenario.js';

const fluidCache = new Map<string, FluidState>();
const FLUID_CACHE_LIMIT = 2_000;

/** Resolve a fluid from the catalogue and/or explicit values; warnings and sources go to `notes`. */
export function resolveFluidInput(input: FluidInput, field: string, notes: Notes): FluidState {
  // Catalogue evaluation (IAPWS and friends) is pure: memoise by the canonical spec and field.
  const key = `${field}|${canonicalJson(input)}`;
  let state = fluidCache.get(key);
  if (state === undefined) {
    state = resolveFluidUncached(input, field);
    if (fluidCache.size >= FLUID_CACHE_LIMIT) fluidCache.clear();
    fluidCache.set(key, state);
  }
  notes.cite(...state.references);
  for (const w of state.warnings) notes.warn(w.code, `${field}: ${w.message}`, w.severity);
  return { ...state, origins: { ...state.origins }, references: [...state.references], warnings: [...state.warnings] };
}

function resolveFluidUncached(input: FluidInput, field: string): FluidState {
  const { kinematicViscosity, ...spec } = input;
  let state: FluidState;
  if (kinematicViscosity !== undefined) {
    if (spec.fluid === undefined) {
      // Explicit density is required by the schema when no catalogue id is given.
      state = resolveFluid({ ...spec, viscosity: kinematicViscosity * (spec.density as number) }, field);
    } else {
      const base = resolveFluid(spec, field);
      state = resolveFluid({ ...spec, viscosity: kinematicViscosity * base.density }, field);
    }
    state.origins.viscosity = 'input (kinematic viscosity × density)';
  } else {
    state = resolveFluid(spec, field);
  }
  return state;
}

/** The fluid as echoed in responses: values and their origins, without the notes already merged. */
export function fluidEcho(state: FluidState): Omit<FluidState, 'references' | 'warnings'> {
  const { references: _references, warnings: _warnings, ...echo } = state;
  return echo;
}

export function resolveTexture(input: TextureInput): Texture {
  return { ...input, flowAngle: input.flowAngle ?? 0 };
}

export function resolveFlow(input: FlowInput, fluid: FluidState, notes: Notes, texture?: Texture): FlowResult {
  const out = evaluateFlow(fluid, input, texture);
  notes.merge(out);
  return out.result;
}

export interface DesignInput {
  texture: TextureInput;
  lubricant: FluidInput;
  workingFluid: FluidInput;
  flow: FlowInput;
  interfacialTension?: number;
}

/**
 * Resolve the shared design parts into a physics Scenario: fluids from the catalogue,
 * flow conditions on the working fluid, interfacial tension from input, catalogue or Fowkes.
 * `needsTension: false` leaves an unknown tension undefined instead of failing.
 */
export function resolveDesign(input: DesignInput, notes: Notes, needsTension = true): { scenario: Scenario; flow: FlowResult; tensionOrigin?: string } {
  const lubricant = resolveFluidInput(input.lubricant, 'lubricant', notes);
  const workingFluid = resolveFluidInput(input.workingFluid, 'workingFluid', notes);
  const texture = resolveTexture(input.texture);
  // Below molecular size no model applies (422); below 100 nm a caution (src/physics/continuum.ts).
  checkContinuumScale(texture, notes);
  const flow = resolveFlow(input.flow, workingFluid, notes, texture);
  let interfacialTension: number | undefined;
  let tensionOrigin: string | undefined;
  try {
    const t = resolveInterfacialTension(lubricant, workingFluid, input.interfacialTension, notes);
    interfacialTension = t.value;
    tensionOrigin = t.origin;
  } catch (error) {
    if (needsTension) throw error;
  }
  return {
    scenario: { texture, lubricant, workingFluid, flow, ...(interfacialTension === undefined ? {} : { interfacialTension }) },
    flow,
    ...(tensionOrigin === undefined ? {} : { tensionOrigin }),
  };
}

/** Echo of a resolved design for the response's `inputs`. */
export function designEcho(scenario: Scenario, flowInput: FlowInput): Record<string, unknown> {
  return {
    texture: scenario.texture,
    lubricant: fluidEcho(scenario.lubricant),
    workingFluid: fluidEcho(scenario.workingFluid),
    flow: flowInput,
    ...(scenario.interfacialTension === undefined ? {} : { interfacialTension: scenario.interfacialTension }),
  };
}
