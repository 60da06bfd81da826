/**
 * The catalogue as the physics' design composition sees it
 * (src/core/catalogue.ts): fluids and surfactants resolved from a reference
 * (id and/or explicit values). Fluid look-ups are pure and repeated across
 * requests, so they are memoised (bounded).
 */
import type { Catalogue, FluidSpec, SurfactantSpec } from '../core/catalogue.js';
import type { FluidState } from '../core/fluid.js';
import type { InterfaceType } from '../core/surfactant.js';
import { resolveFluid } from './resolve.js';
import { getSurfactant, resolveSurfactant } from './surfactants.js';
import { userCatalogueGeneration } from './user-catalogue.js';

const fluidCache = new Map<string, FluidState>();
const FLUID_CACHE_LIMIT = 2_000;

function fluidKey(spec: FluidSpec, field: string): string {
  // The common request names a catalogue fluid and a temperature only: a key without sorting and serialising.
  const keys = Object.keys(spec);
  if (keys.length === 2 && typeof spec.id === 'string' && typeof spec.temperature === 'number') {
    return `${userCatalogueGeneration()}|${field}|id-temperature|${spec.id}|${spec.temperature}`;
  }
  const entries = Object.entries(spec)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : 1));
  // The user catalogue is installed at start-up; its generation keeps a test's re-install from reading stale entries.
  return `${userCatalogueGeneration()}|${field}|${JSON.stringify(entries)}`;
}

/** A copy the caller may change without touching the cached state. */
function copy(state: FluidState): FluidState {
  return { ...state, origins: { ...state.origins }, references: [...state.references], warnings: [...state.warnings] };
}

export const catalogue: Catalogue = {
  fluid(spec, field) {
    const key = fluidKey(spec, field);
    let state = fluidCache.get(key);
    if (state === undefined) {
      state = resolveFluid(spec, field);
      if (fluidCache.size >= FLUID_CACHE_LIMIT) fluidCache.clear();
      fluidCache.set(key, state);
    }
    return copy(state);
  },
  surfactant(spec: SurfactantSpec, interfaceType: InterfaceType, field: string) {
    const { id, name, ...parameters } = spec;
    return resolveSurfactant(
      {
        interfaceType,
        ...(id === undefined ? {} : { id }),
        ...(name === undefined ? {} : { name }),
        ...(Object.keys(parameters).length === 0 ? {} : { parameters }),
      },
      field,
    );
  },
  surfactantInterfaces(id) {
    const entry = getSurfactant(id);
    return entry === undefined ? undefined : (Object.keys(entry.interfaces) as InterfaceType[]);
  },
  surfactantName(id) {
    return getSurfactant(id)?.name;
  },
};
