/**
 * Two-dimensional Stokes flow across one period of a grooved wall with a flat,
 * impermeable interface (the transverse groove cell), on a staggered (MAC)
 * tensor-product mesh (Harlow, F. H. & Welch, J. E. 1965, Phys. Fluids 8(12),
 * 2182–2189, doi:10.1063/1.1761178):
 *
 *     −div(μ grad u) + ∂p/∂x = 0,  −div(μ grad v) + ∂p/∂y = 0,  ∂u/∂x + ∂v/∂y = 0
 *
 * in the water (y > 0, viscosity μ_w) and in the lubricant-filled cavity
 * (−d < y < 0, |x| < w/2, viscosity μ_o), x periodic. Unknowns: u on the west
 * face of every cell, v on the bottom face, p at the centre. v = 0 on the whole
 * line y = 0 (flat interface: water and cavity exchange no mass, so each has its
 * own pressure level); u and μ ∂u/∂y are continuous across the mouth through
 * the harmonic face viscosity; no slip on solid faces; μ_w ∂u/∂y = τ and v = 0
 * at the top. μ_o = 0 removes the cavity (zero-stress mouth).
 *
 * Solution: the Uzawa / pressure Schur complement method — conjugate gradients
 * on S p = −D A⁻¹ f with S = D A⁻¹ Dᵀ (symmetric positive semidefinite, null
 * space = one constant per fluid region), each application of A⁻¹ done by the
 * multigrid-preconditioned CG of ./multigrid.ts, preconditioned by the
 * viscosity-weighted inverse pressure mass matrix μ/|cell|. For one viscosity
 * this is the pressure mass-matrix preconditioner of the Stokes Schur
 * complement, spectrally equivalent to S⁻¹ uniformly in the mesh (Elman,
 * Silvester & Wathen 2014, Finite Elements and Fast Iterative Solvers, 2nd ed.,
 * Oxford University Press); the cell-by-cell 1/μ weighting for the viscosity
 * jump between the regions is our extension of it, not taken from the book.
 */

import { MultigridPreconditioner, solvePcg, type FivePointOperator } from './multigrid.js';

export interface StokesCellProblem {
  /** Column widths (m), periodic direction, left to right. */
  widths: Float64Array;
  /** Row heights (m), bottom (groove floor y = −d) to top (y = H). */
  heights: Float64Array;
  /** Rows 0 … interfaceRow − 1 are below the interface y = 0. */
  interfaceRow: number;
  /** Columns grooveFirst … grooveLast form the groove. */
  grooveFirst: number;
  grooveLast: number;
  /** μ_w (Pa·s) > 0. */
  waterViscosity: number;
  /** μ_o (Pa·s) ≥ 0; 0 = shear-free mouth, no cavity flow. */
  lubricantViscosity: number;
  /** Applied shear τ (Pa) at the top. */
  topShear: number;
  /** Relative residual of the pressure iteration (default 1e-8). */
  tolerance?: number;
  /** Cap on pressure (outer) iterations (default 400). */
  maxIterations?: number;
}

export interface StokesCellResult {
  /** u at the west face of cell (i, j), index j·nx + i (m/s). */
  u: Float64Array;
  /** v at the bottom face of row j in column i, index j·nx + i, j = 0 … ny (m/s). */
  v: Float64Array;
  /** Pressure at cell centres (Pa), zero mean per fluid region; 0 outside the fluid. */
  p: Float64Array;
  /** Outer (pressure) iterations. */
  iterations: number;
  /** Final relative residual of the pressure equation. */
  residual: number;
  converged: boolean;
  /** Velocity plus pressure unknowns. */
  unknowns: number;
}

export function solveStokesCell(problem: StokesCellProblem): StokesCellResult {
  const { widths, heights, interfaceRow: j0, grooveFirst, grooveLast, waterViscosity: muW, lubricantViscosity: muO, topShear } = problem;
  const nx = widths.length;
  const ny = heights.length;
  const cavity = muO > 0;
  const tolerance = problem.tolerance ?? 1e-8;
  const maxIterations = problem.maxIterations ?? 400;
  const innerTolerance = Math.min(1e-10, tolerance * 1e-2);
  const inGroove = (i: number): boolean => i >= grooveFirst && i <= grooveLast;
  const viscosityOfRow = (j: number): number => (j >= j0 ? muW : muO);

  // ---- u operator (nx × ny, periodic) ----
  const uCount = nx * ny;
  const uWest = new Float64Array(uCount);
  const uSouth = new Float64Array(uCount);
  const uDiag = new Float64Array(uCount);
  const uActive = new Uint8Array(uCount);
  const uRhs = new Float64Array(uCount);
  const faceWidth = new Float64Array(nx);
  for (let i = 0; i < nx; i++) faceWidth[i] = 0.5 * (widths[i] + widths[(i + nx - 1) % nx]);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      // Faces strictly between two groove columns are free below y = 0; the two wall faces are not.
      uActive[j * nx + i] = j >= j0 || (cavity && i > grooveFirst && i <= grooveLast) ? 1 : 0;
    }
  }
  for (let j = 0; j < ny; j++) {
    const mu = viscosityOfRow(j);
    for (let i = 0; i < nx; i++) {
      const c = j * nx + i;
      const w = j * nx + ((i + nx - 1) % nx);
      // x-neighbours are one column width apart (the column between the two faces).
      const gx = (mu * heights[j]) / widths[(i + nx - 1) % nx];
      if (uActive[c] && uActive[w]) {
        uWest[c] = gx;
        uDiag[c] += gx;
        uDiag[w] += gx;
      } else if (uActive[c] && !uActive[w]) uDiag[c] += gx;
      else if (!uActive[c] && uActive[w]) uDiag[w] += gx;
    }
  }
  for (let j = 1; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = j * nx + i;
      const s = c - nx;
      const harmonic = (length: number): number =>
        muO > 0 || j !== j0 ? length / (heights[j - 1] / (2 * viscosityOfRow(j - 1)) + heights[j] / (2 * viscosityOfRow(j))) : 0;
      if (uActive[c] && uActive[s]) {
        const g = harmonic(faceWidth[i]);
        uSouth[c] = g;
        uDiag[c] += g;
        uDiag[s] += g;
      } else if (uActive[c] && j === j0) {
        // Water node above y = 0 whose lower neighbour is not free: the ridge part of its control
        // width sees a no-slip wall on the face y = 0; the mouth part couples to the groove wall
        // node (u = 0) through the harmonic viscosity (nothing for a zero-stress mouth).
        const westColumn = (i + nx - 1) % nx;
        const westPart = widths[westColumn] / 2;
        const eastPart = widths[i] / 2;
        const wall = (length: number): number => (muW * length) / (heights[j] / 2);
        let g = 0;
        g += inGroove(westColumn) ? harmonic(westPart) : wall(westPart);
        g += inGroove(i) ? harmonic(eastPart) : wall(eastPart);
        uDiag[c] += g;
      }
      // (Inside the cavity a free face never sits above or below a fixed one: walls are whole columns of faces.)
    }
  }
  for (let i = 0; i < nx; i++) {
    const bottom = i;
    if (uActive[bottom]) uDiag[bottom] += (viscosityOfRow(0) * faceWidth[i]) / (heights[0] / 2); // groove floor, no slip
    const top = (ny - 1) * nx + i;
    uRhs[top] += topShear * faceWidth[i];
  }
  const uOp: FivePointOperator = { nx, ny, periodicX: true, west: uWest, south: uSouth, diagonal: uDiag, active: uActive };

  // ---- v operator (nx × (ny + 1), periodic) ----
  const vy = ny + 1;
  const vCount = nx * vy;
  const vWest = new Float64Array(vCount);
  const vSouth = new Float64Array(vCount);
  const vDiag = new Float64Array(vCount);
  const vActive = new Uint8Array(vCount);
  for (let j = 1; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      vActive[j * nx + i] = j > j0 || (cavity && j < j0 && inGroove(i)) ? 1 : 0;
    }
  }
  const vHeight = (j: number): number => 0.5 * (heights[j - 1] + heights[j]);
  for (let j = 1; j < ny; j++) {
    const mu = j > j0 ? muW : muO;
    for (let i = 0; i < nx; i++) {
      const c = j * nx + i;
      if (!vActive[c]) continue;
      const iw = (i + nx - 1) % nx;
      const w = j * nx + iw;
      if (vActive[w]) {
        const g = (mu * vHeight(j)) / (0.5 * (widths[iw] + widths[i]));
        vWest[c] = g;
        vDiag[c] += g;
        vDiag[w] += g;
      } else {
        vDiag[c] += (mu * vHeight(j)) / (widths[i] / 2); // groove side wall on the column face
      }
      const ie = (i + 1) % nx;
      if (!vActive[j * nx + ie]) vDiag[c] += (mu * vHeight(j)) / (widths[i] / 2);
    }
  }
  for (let j = 1; j <= ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = j * nx + i;
      const s = c - nx;
      const mu = j - 1 >= j0 ? muW : muO;
      const g = (mu * widths[i]) / heights[j - 1];
      if (vActive[c] && vActive[s]) {
        vSouth[c] = g;
        vDiag[c] += g;
        vDiag[s] += g;
      } else if (vActive[c]) vDiag[c] += g;
      else if (vActive[s]) vDiag[s] += g;
    }
  }
  const vOp: FivePointOperator = { nx, ny: vy, periodicX: true, west: vWest, south: vSouth, diagonal: vDiag, active: vActive };

  // ---- pressure cells and regions ----
  const pCount = nx * ny;
  const region = new Int8Array(pCount).fill(-1); // 0 water, 1 cavity
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      if (j >= j0) region[j * nx + i] = 0;
      else if (cavity && inGroove(i)) region[j * nx + i] = 1;
    }
  }
  const pScale = new Float64Array(pCount);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = j * nx + i;
      if (region[c] >= 0) pScale[c] = viscosityOfRow(j) / (widths[i] * heights[j]);
    }
  }

  const uPre = new MultigridPreconditioner(uOp);
  const vPre = new MultigridPreconditioner(vOp);
  const u = new Float64Array(uCount);
  const v = new Float64Array(vCount);
  const uB = new Float64Array(uCount);
  const vB = new Float64Array(vCount);
  let innerFailure = false;

  /** Velocity for pressure p: solve A U = f + Dᵀ p (f only when withForcing). */
  const velocityFor = (p: Float64Array, withForcing: boolean): void => {
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const c = j * nx + i;
        const w = j * nx + ((i + nx - 1) % nx);
        uB[c] = uActive[c] ? (withForcing ? uRhs[c] : 0) + (p[w] - p[c]) * heights[j] : 0;
      }
    }
    for (let j = 1; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const c = j * nx + i;
        vB[c] = vActive[c] ? (p[c - nx] - p[c]) * widths[i] : 0;
      }
    }
    u.fill(0);
    v.fill(0);
    const ru = solvePcg(uOp, uB, u, uPre, innerTolerance, 200);
    const rv = solvePcg(vOp, vB, v, vPre, innerTolerance, 200);
    if (!ru.converged && ru.residual > 1e-8) innerFailure = true;
    if (!rv.converged && rv.residual > 1e-8) innerFailure = true;
  };
  /** out = D U (net outflow per pressure cell). */
  const divergence = (out: Float64Array): void => {
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const c = j * nx + i;
        if (region[c] < 0) {
          out[c] = 0;
          continue;
        }
        const e = j * nx + ((i + 1) % nx);
        out[c] = (u[e] - u[c]) * heights[j] + (v[c + nx] - v[c]) * widths[i];
      }
    }
  };
  const project = (x: Float64Array): void => {
    const sum = [0, 0];
    const count = [0, 0];
    for (let c = 0; c < pCount; c++) {
      if (region[c] >= 0) {
        sum[region[c]] += x[c];
        count[region[c]]++;
      }
    }
    for (let c = 0; c < pCount; c++) if (region[c] >= 0) x[c] -= sum[region[c]] / Math.max(1, count[region[c]]);
  };
  const dot = (a: Float64Array, b: Float64Array): number => {
    let s = 0;
    for (let c = 0; c < pCount; c++) s += a[c] * b[c];
    return s;
  };

  // b_S = −D A⁻¹ f
  const p = new Float64Array(pCount);
  const r = new Float64Array(pCount);
  const z = new Float64Array(pCount);
  const d = new Float64Array(pCount);
  const q = new Float64Array(pCount);
  velocityFor(p, true);
  divergence(r);
  for (let c = 0; c < pCount; c++) r[c] = -r[c];
  project(r);
  const bNorm = Math.sqrt(dot(r, r));
  let rNorm = bNorm;
  let iterations = 0;
  let converged = bNorm === 0;
  if (!converged) {
    for (let c = 0; c < pCount; c++) z[c] = pScale[c] * r[c];
    project(z);
    d.set(z);
    let rz = dot(r, z);
    for (iterations = 1; iterations <= maxIterations; iterations++) {
      velocityFor(d, false);
      divergence(q);
      project(q);
      const dq = dot(d, q);
      if (!(dq > 0) || !Number.isFinite(dq)) break;
      const alpha = rz / dq;
      for (let c = 0; c < pCount; c++) {
        p[c] += alpha * d[c];
        r[c] -= alpha * q[c];
      }
      rNorm = Math.sqrt(dot(r, r));
      if (!Number.isFinite(rNorm)) break;
      if (rNorm <= tolerance * bNorm) {
        converged = true;
        break;
      }
      for (let c = 0; c < pCount; c++) z[c] = pScale[c] * r[c];
      project(z);
      const rzNew = dot(r, z);
      const beta = rzNew / rz;
      rz = rzNew;
      for (let c = 0; c < pCount; c++) d[c] = z[c] + beta * d[c];
    }
    iterations = Math.min(iterations, maxIterations);
  }
  project(p);
  velocityFor(p, true);
  let unknowns = 0;
  for (let c = 0; c < uCount; c++) unknowns += uActive[c];
  for (let c = 0; c < vCount; c++) unknowns += vActive[c];
  for (let c = 0; c < pCount; c++) unknowns += region[c] >= 0 ? 1 : 0;
  const finite = u.every(Number.isFinite) && v.every(Number.isFinite);
  return {
    u,
    v,
    p,
    iterations,
    residual: bNorm === 0 ? 0 : rNorm / bNorm,
    converged: converged && !innerFailure && finite,
    unknowns,
  };
}
