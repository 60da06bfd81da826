/**
 * Field method of the heat model: conduction on one texture period of the wall
 * (the exact thermal slip length of a flat interface), and laminar fully
 * developed flow and heat transfer solved together on the cross-section of a
 * channel with one or two textured walls. Finite volumes with harmonic face
 * conductances (Patankar 1980, patankar1980) on ../../numerics/cell-diffusion.ts.
 * Symbols as in ./heat.ts.
 */
import { ConvergenceError } from '../../core/errors.js';
import { solveCellDiffusion, type CellDiffusionResult } from '../../numerics/cell-diffusion.js';
import { grooveLayout } from '../groove/cell-mesh.js';

export type LubricantMotion = 'co-flowing' | 'zero-net-flux';

/** Geometry and materials of one texture period of the wall (SI). */
export interface WallCell {
  pitch: number;
  /** w, m; 0 gives a smooth wall (grooves filled by the solid). */
  grooveWidth: number;
  grooveDepth: number;
  substrateThickness: number;
  workingConductivity: number;
  lubricantConductivity: number;
  solidConductivity: number;
}

interface CellGrid {
  widths: number[];
  heights: number[];
  /** Per cell: 0 solid, 1 lubricant, 2 working liquid. */
  material: Uint8Array;
  nx: number;
  ny: number;
}

/**
 * Largest spanwise cell of the field grids is P/32; the shared edge-graded mesh refines towards the groove
 * edges from there. Measured against Philip's adiabatic-groove b_t (the hardest, singular case): 0.79 % at 32,
 * 0.38 % at 48, 0.23 % at 64, 0.07 % at 128 (the former uniform grid: 5.2 % at 64); the cost per solve is
 * that of the former uniform grid at 64.
 */
const FIELD_CELLS_PER_PITCH = 32;

export function uniformCells(length: number, count: number): number[] {
  return new Array<number>(count).fill(length / count);
}

/** Cells growing geometrically (factor 1.08) from `first` up to `largest`, then uniform, summing to `length`. */
function stretchedCells(length: number, first: number, largest: number): number[] {
  const cells: number[] = [];
  let total = 0;
  let size = Math.min(first, length);
  while (total + size < length) {
    cells.push(size);
    total += size;
    size = Math.min(size * 1.08, largest);
  }
  const rest = length - total;
  // Merge a sliver into the last cell rather than leaving a tiny cell at the top.
  if (cells.length > 0 && rest < 0.5 * cells[cells.length - 1]) cells[cells.length - 1] += rest;
  else cells.push(rest);
  return cells;
}

/**
 * Grid of one period: x = [ridge half | groove | ridge half] so that the groove
 * walls lie on cell faces; y = substrate, groove layer, working-liquid layer of
 * height `liquidHeight` above the ridge-top plane.
 */
function buildGrid(wall: WallCell, liquidHeight: number, topRefined: boolean, cellsPerPitch = FIELD_CELLS_PER_PITCH): CellGrid {
  const { pitch, grooveWidth, grooveDepth, substrateThickness } = wall;
  const spacing = pitch / cellsPerPitch;
  const smooth = grooveWidth === 0;
  // The groove cell's edge-graded layout (../groove/cell-mesh.ts): columns and groove rows graded towards the
  // groove edges and mouth, near rows graded away from it; the smooth wall needs no spanwise resolution.
  const layout = smooth ? null : grooveLayout(pitch, grooveWidth, grooveDepth, spacing, (topRefined ? liquidHeight / 2 : liquidHeight) / 4);
  const widths = layout === null ? uniformCells(pitch, 2) : layout.widths;
  const heights: number[] = [];
  if (substrateThickness > 0) heights.push(...uniformCells(substrateThickness, Math.min(48, Math.max(4, Math.round(substrateThickness / spacing)))));
  const substrateRows = heights.length;
  if (layout !== null) heights.push(...layout.cavity);
  const grooveRows = heights.length - substrateRows;
  const largest = liquidHeight / 160;
  // Above the near rows the cells grow geometrically to the largest size (and mirror towards a no-slip top wall).
  const column = (length: number): number[] => {
    if (layout === null) return stretchedCells(length, largest, largest);
    const near = layout.near;
    return [...near, ...stretchedCells(length - layout.nearHeight, Math.min(near[near.length - 1], largest), largest)];
  };
  let liquid = column(liquidHeight);
  if (topRefined) {
    // A no-slip top wall: mirror the stretching so both walls are resolved alike.
    const half = column(liquidHeight / 2);
    liquid = [...half, ...half.slice().reverse()];
  }
  heights.push(...liquid);
  const nx = widths.length;
  const ny = heights.length;
  const material = new Uint8Array(nx * ny);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      let m = 0;
      if (j >= substrateRows + grooveRows) m = 2;
      else if (j >= substrateRows && layout !== null && i >= layout.grooveFirst && i <= layout.grooveLast) m = 1;
      material[j * nx + i] = m;
    }
  }
  return { widths, heights, material, nx, ny };
}

export function requireSolved(result: CellDiffusionResult, what: string): void {
  if (!result.converged) throw new ConvergenceError(what, result.iterations, result.residual);
}

/**
 * Exact (to discretisation) conduction solution on one period [derived]: the
 * wall cell with a working-liquid layer of height L = 4P above, isothermal
 * substrate bottom and isothermal top; b_t = k_w (R − R_ref) with the total
 * resistance R = ΔT/q and R_ref = (s + d)/k_s + L/k_w for the solid-filled wall.
 * Finite volumes with harmonic face conductances (Patankar (Patankar 1980)) are exact for a
 * layered medium, so equal lubricant and solid conductivities give b_t = 0 to
 * rounding. Valid for a flat interface and P ≪ channel height.
 * Accuracy: the mesh is the groove cell's, graded towards the groove edges
 * (../groove/cell-mesh.ts), so even near the adiabatic-groove extreme
 * (k_o ≪ k_w ≪ k_s), where the edge singularity is strongest, convergence is
 * close to second order: 0.8 % high at the default 32 cells per pitch, 0.1 % at
 * 96 (convergence study against Philip's exact value in the tests).
 * @param cellsPerPitch grid resolution across one period (default 32)
 * @returns b_t, m
 */
export function thermalSlipField(wall: WallCell, cellsPerPitch = FIELD_CELLS_PER_PITCH): { thermalSlipLength: number; iterations: number; cells: number } {
  const liquidHeight = 4 * wall.pitch;
  const grid = buildGrid(wall, liquidHeight, false, cellsPerPitch);
  const k = Float64Array.from(grid.material, (m) =>
    m === 0 ? wall.solidConductivity : m === 1 ? wall.lubricantConductivity : wall.workingConductivity,
  );
  const r = solveCellDiffusion({
    widths: grid.widths,
    heights: grid.heights,
    coefficient: k,
    bottom: { kind: 'value', value: 0 },
    top: { kind: 'value', value: -1 },
    tolerance: 1e-12,
    maxIterations: 400,
  });
  requireSolved(r, 'wall conduction cell');
  const top = grid.ny - 1;
  const halfTop = grid.heights[top] / 2;
  let flux = 0;
  for (let i = 0; i < grid.nx; i++) flux += (wall.workingConductivity * (r.field[top * grid.nx + i] + 1) * grid.widths[i]) / halfTop;
  flux /= wall.pitch;
  const wallDepth = wall.substrateThickness + (wall.grooveWidth === 0 ? 0 : wall.grooveDepth);
  const referenceResistance = wallDepth / wall.solidConductivity + liquidHeight / wall.workingConductivity;
  return {
    thermalSlipLength: wall.workingConductivity * (1 / flux - referenceResistance),
    iterations: r.iterations,
    cells: grid.nx * grid.ny,
  };
}

export interface CrossSectionInput {
  wall: WallCell;
  /** Channel full height H between the ridge-top planes, m. */
  height: number;
  /** 'both': both walls textured and heated alike (mid-plane symmetry); 'one': the opposite wall smooth, no-slip, adiabatic. */
  heatedWalls: 'one' | 'both';
  workingViscosity: number;
  lubricantViscosity: number;
  /** ρc of the working liquid and of the lubricant, J/(m³·K). */
  workingHeatCapacity: number;
  lubricantHeatCapacity: number;
  lubricantMotion: LubricantMotion;
  /** Grid cells across one period (default 64). */
  cellsPerPitch?: number;
}

export interface CrossSectionResult {
  /** Nu on D_h = 2H with the wall temperature of the solid-filled wall's ridge-top plane; null if that temperature difference is not positive. */
  nusselt: number | null;
  /** Overall conductance from the isothermal substrate bottom to the bulk, W/(m²·K) per (k_w/D_h): Nu_overall = U D_h/k_w. */
  overallNusselt: number;
  /** Fanning f·Re on D_h at the same working-liquid flow rate. */
  frictionFactorReynolds: number;
  /** Apparent slip length from the flow-rate gain, m. */
  slipLength: number;
  /** Working-liquid flow rate over that of the smooth channel at the same pressure gradient. */
  flowRateRatio: number;
  cells: number;
}

/**
 * Field method [derived]: laminar fully developed flow and heat transfer with
 * axially uniform heat input, solved together on the cross-section of one
 * texture period (grooves along the flow), no homogenisation:
 *   ∇·(μ∇u) = −G in liquid and lubricant, u = 0 in the solid;
 *   ∇·(k∇T) = ρc u dT_b/dx in liquid and lubricant, conduction in the solid,
 * with the substrate bottom isothermal (peripherally uniform wall temperature,
 * axially uniform flux: the H1 condition of Shah & London (Shah & London 1978)) and a
 * symmetry plane at H/2 ('both') or a smooth adiabatic no-slip wall at H ('one').
 * Zero-net-flux lubricant: a second solve with a pressure gradient acting in the
 * groove alone is superposed so that the groove carries no net flow. The heat
 * flux is q = ∫ρc u dA (dT_b/dx)/P; the bulk temperature is the working
 * liquid's mixing-cup mean; h = q/(T_ref − T_b) with T_ref the ridge-top
 * temperature of the solid-filled wall carrying q, T_ref = T_bottom − q (s + d)/k_s,
 * so that Nu matches the closed forms' definition of b_t. Slip length from the
 * flow rate: 'both' Q/Q₀ = 1 + 6b/H, 'one' Q/Q₀ = (H + 4b)/(H + b) (exact
 * laminar results). Discretisation: ./../numerics/cell-diffusion.ts, second order.
 */
export function solveHeatCrossSection(input: CrossSectionInput): CrossSectionResult {
  const { wall, height } = input;
  const both = input.heatedWalls === 'both';
  const liquidHeight = both ? height / 2 : height;
  const grid = buildGrid(wall, liquidHeight, !both, input.cellsPerPitch ?? FIELD_CELLS_PER_PITCH);
  const n = grid.nx * grid.ny;
  const fixed = Uint8Array.from(grid.material, (m) => (m === 0 ? 1 : 0));
  const viscosity = Float64Array.from(grid.material, (m) => (m === 0 ? 1 : m === 1 ? input.lubricantViscosity : input.workingViscosity));
  const base = {
    widths: grid.widths,
    heights: grid.heights,
    coefficient: viscosity,
    fixed,
    bottom: { kind: 'value', value: 0 } as const,
    top: both ? ({ kind: 'flux', value: 0 } as const) : ({ kind: 'value', value: 0 } as const),
    tolerance: 1e-12,
    maxIterations: 400,
  };
  const drive = Float64Array.from(grid.material, (m) => (m === 0 ? 0 : -1));
  const flow = solveCellDiffusion({ ...base, source: drive });
  requireSolved(flow, 'cross-section velocity');
  const velocity = Float64Array.from(flow.field);
  const area = (index: number) => grid.widths[index % grid.nx] * grid.heights[Math.floor(index / grid.nx)];
  const hasGroove = wall.grooveWidth > 0;
  if (input.lubricantMotion === 'zero-net-flux' && hasGroove) {
    const grooveDrive = Float64Array.from(grid.material, (m) => (m === 1 ? -1 : 0));
    const correction = solveCellDiffusion({ ...base, source: grooveDrive });
    requireSolved(correction, 'cross-section groove back-pressure');
    let q1 = 0;
    let q2 = 0;
    for (let c = 0; c < n; c++) {
      if (grid.material[c] === 1) {
        q1 += velocity[c] * area(c);
        q2 += correction.field[c] * area(c);
      }
    }
    const factor = -q1 / q2;
    for (let c = 0; c < n; c++) velocity[c] += factor * correction.field[c];
  }
  let workingFlux = 0;
  let heatInput = 0;
  const heatSource = new Float64Array(n);
  for (let c = 0; c < n; c++) {
    const m = grid.material[c];
    if (m === 2) workingFlux += velocity[c] * area(c);
    if (m !== 0) {
      heatSource[c] = (m === 1 ? input.lubricantHeatCapacity : input.workingHeatCapacity) * velocity[c];
      heatInput += heatSource[c] * area(c);
    }
  }
  // Smooth channel at the same pressure gradient (G = 1 per unit μ_w): Q₀ = P h³/(3μ) per half channel, P H³/(12μ) full.
  const smoothFlux = both
    ? (wall.pitch * liquidHeight ** 3) / (3 * input.workingViscosity)
    : (wall.pitch * liquidHeight ** 3) / (12 * input.workingViscosity);
  const flowRateRatio = workingFlux / smoothFlux;
  const slipLength = both ? (height * (flowRateRatio - 1)) / 6 : (height * (flowRateRatio - 1)) / (4 - flowRateRatio);
  const conductivity = Float64Array.from(grid.material, (m) =>
    m === 0 ? wall.solidConductivity : m === 1 ? wall.lubricantConductivity : wall.workingConductivity,
  );
  const thermal = solveCellDiffusion({
    widths: grid.widths,
    heights: grid.heights,
    coefficient: conductivity,
    source: heatSource,
    bottom: { kind: 'value', value: 0 },
    top: { kind: 'flux', value: 0 },
    tolerance: 1e-12,
    maxIterations: 400,
  });
  requireSolved(thermal, 'cross-section temperature');
  let mixed = 0;
  for (let c = 0; c < n; c++) if (grid.material[c] === 2) mixed += velocity[c] * thermal.field[c] * area(c);
  const bulkTemperature = mixed / workingFlux;
  const wallFlux = heatInput / wall.pitch;
  const wallDepth = wall.substrateThickness + (hasGroove ? wall.grooveDepth : 0);
  const referenceTemperature = -wallFlux * (wallDepth / wall.solidConductivity);
  const hydraulicDiameter = 2 * height;
  const difference = referenceTemperature - bulkTemperature;
  const nusselt = difference > 0 ? (wallFlux * hydraulicDiameter) / (difference * wall.workingConductivity) : null;
  const overallNusselt = (wallFlux * hydraulicDiameter) / (-bulkTemperature * wall.workingConductivity);
  return {
    nusselt,
    overallNusselt,
    frictionFactorReynolds: 24 / flowRateRatio,
    slipLength,
    flowRateRatio,
    cells: n,
  };
}
