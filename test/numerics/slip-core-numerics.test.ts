import { describe, expect, it } from 'vitest';
import { choleskyInPlace, forwardSubstitute, leadingSolution, nestedProducts } from '../../src/numerics/cholesky.js';
import { extrapolateToInfiniteResolution } from '../../src/numerics/extrapolation.js';
import { layerModeTransform, twoPhaseLayerModes } from '../../src/numerics/layer-modes.js';
import { solveDense } from '../../src/numerics/linalg.js';
import { eulerAlternatingTail } from '../../src/numerics/series.js';
import { smallestWedgeExponent } from '../../src/numerics/wedge-exponent.js';
import { addWindowOverlapMatrix, windowFourierSums } from '../../src/numerics/window-fourier.js';

/** A fixed symmetric positive-definite test matrix (Hilbert-like plus diagonal; common practice, no source). */
function testMatrix(n: number): Float64Array {
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) a[i * n + j] = 1 / (i + j + 1) + (i === j ? 1 : 0);
  return a;
}

describe('nested Cholesky', () => {
  it('every leading block gives the same solution and quadratic form as a direct solve of that block (Golub & Van Loan §4.2 nesting)', () => {
    const n = 7;
    const a = testMatrix(n);
    const b = Float64Array.from({ length: n }, (_, i) => 1 + 0.3 * i);
    const j = Float64Array.from({ length: n }, (_, i) => Math.cos(i));
    const l = a.slice();
    expect(choleskyInPlace(l, n)).toBe(true);
    const y = forwardSubstitute(l, b, n);
    const z = forwardSubstitute(l, j, n);
    const quadratic = nestedProducts(y, y);
    const functional = nestedProducts(z, y);
    for (let m = 1; m <= n; m++) {
      const block = new Float64Array(m * m);
      for (let r = 0; r < m; r++) for (let c = 0; c < m; c++) block[r * m + c] = a[r * n + c];
      const x = solveDense(block, b.subarray(0, m), m) as Float64Array;
      const nested = leadingSolution(l, n, y, m);
      for (let r = 0; r < m; r++) expect(nested[r]).toBeCloseTo(x[r], 12);
      let bx = 0;
      let jx = 0;
      for (let r = 0; r < m; r++) {
        bx += b[r] * x[r];
        jx += j[r] * x[r];
      }
      expect(quadratic[m - 1]).toBeCloseTo(bx, 12);
      expect(functional[m - 1]).toBeCloseTo(jx, 12);
    }
  });
  it('refuses a matrix that is not positive definite', () => {
    expect(choleskyInPlace(Float64Array.from([1, 2, 2, 1]), 2)).toBe(false);
  });
});

describe('extrapolation to infinite resolution', () => {
  it('removes the listed powers exactly: v(M) = 3 + 2M^−0.7 − 5M^−1.7 (constructed exact case)', () => {
    const ms = [8, 10, 12, 16];
    const v = ms.map((m) => 3 + 2 * m ** -0.7 - 5 * m ** -1.7);
    expect(extrapolateToInfiniteResolution(ms, v, [0.7, 1.7]).value).toBeCloseTo(3, 10);
    // One exponent short: the fit is no longer exact (the test can fail).
    expect(Math.abs(extrapolateToInfiniteResolution(ms.slice(2), v.slice(2), [0.7]).value - 3)).toBeGreaterThan(1e-3);
  });
});

describe('corner exponents of multi-material wedges', () => {
  it('homogeneous wedges: λ = π/angle between two zero-value rays (exact solution u = r^{π/ω} sin(πθ/ω), harmonic and zero on both rays by substitution)', () => {
    expect(smallestWedgeExponent([{ angle: Math.PI, coefficient: 1 }], 'zero-value')).toBeCloseTo(1, 9);
    expect(smallestWedgeExponent([{ angle: (3 * Math.PI) / 2, coefficient: 2 }], 'zero-value')).toBeCloseTo(2 / 3, 9);
  });
  it('groove lip: liquid half-plane and lubricant quadrant, N = 1 is the homogeneous 3π/2 wedge (λ = 2/3); N → 0 tends to ½ (shear-free edge), N → ∞ to 1', () => {
    const lip = (n: number): number => smallestWedgeExponent([{ angle: Math.PI, coefficient: 1 }, { angle: Math.PI / 2, coefficient: n }], 'zero-value');
    expect(lip(1)).toBeCloseTo(2 / 3, 9);
    expect(lip(1e-6)).toBeCloseTo(0.5, 5);
    expect(lip(1e6)).toBeGreaterThan(0.999);
    // tan(λπ) = −tan(λπ/2)/N (derived in the longitudinal core's comment) at N = 10.
    const l10 = lip(10);
    expect(Math.tan(l10 * Math.PI) + Math.tan((l10 * Math.PI) / 2) / 10).toBeCloseTo(0, 9);
  });
  it('full turn: a homogeneous medium is regular (λ = 1); a contrast brings λ below 1', () => {
    expect(smallestWedgeExponent([{ angle: 2 * Math.PI, coefficient: 1 }], 'periodic')).toBe(1);
    const lip = smallestWedgeExponent(
      [
        { angle: Math.PI, coefficient: 1 },
        { angle: Math.PI / 2, coefficient: 0.01 },
        { angle: Math.PI / 2, coefficient: 100 },
      ],
      'periodic',
    );
    // Insulating groove beside a conducting ridge: the liquid sees a Dirichlet–Neumann half-plane, λ → ½.
    expect(lip).toBeGreaterThan(0.5);
    expect(lip).toBeLessThan(0.52);
  });
});

describe('Fourier overlap sums of window modes', () => {
  /** Brute force Σ_n α_n C_n²/((α² − μ_i²)(α² − μ_j²)) to n = 4e5 plus the 1/(2N²) tail of Σ 1/(2α³) (P = 1). */
  function bruteForce(half: number, mi: number, mj: number): number {
    let s = 0;
    const nMax = 400_000;
    for (let n = 1; n <= nMax; n++) {
      const alpha = 2 * Math.PI * n;
      const c = Math.cos(alpha * half);
      s += (alpha * c * c) / ((alpha * alpha - mi * mi) * (alpha * alpha - mj * mj));
    }
    return s + 1 / (2 * (2 * Math.PI) ** 3 * 2 * nMax * nMax);
  }
  it.each([0.13, 0.5, 0.87])('partial-fraction sums with tails match brute-force summation at w/P = %f', (phi) => {
    const half = phi / 2;
    const mu = Float64Array.from([0.7, 3.1, 17.9, 40.2]);
    const sums = windowFourierSums({ period: 1, halfWidth: half, wavenumbers: mu });
    const matrix = new Float64Array(16);
    addWindowOverlapMatrix(matrix, 4, sums, mu, [1, 1, 1, 1], 1);
    for (const [i, j] of [[0, 0], [1, 2], [0, 3], [3, 3]]) {
      const expected = bruteForce(half, mu[i], mu[j]);
      expect(Math.abs(matrix[i * 4 + j] / expected - 1)).toBeLessThan(1e-8);
    }
  });
  it('a Fourier mode equal to a window wavenumber is left out and reported', () => {
    const sums = windowFourierSums({ period: 1, halfWidth: 0.25, wavenumbers: [2 * Math.PI * 3] });
    expect(sums.coincident[0]).toBe(3);
  });
});

describe('layer modes of a two-phase periodic layer', () => {
  it('equal coefficients give the Fourier modes μ_j = 2πj/P', () => {
    const modes = twoPhaseLayerModes(1, 0.2, 3, 3, 40);
    for (let j = 0; j < modes.wavenumbers.length; j++) expect(modes.wavenumbers[j]).toBeCloseTo(2 * Math.PI * j, 9);
    for (let j = 1; j < modes.wavenumbers.length; j++) expect(Math.abs(modes.slopeJump[j])).toBeLessThan(1e-9);
  });
  it('modes satisfy the interface conditions and are k-orthogonal (Sturm–Liouville); transforms match quadrature', () => {
    const [P, a, kin, kout] = [1, 0.17, 0.05, 4];
    const modes = twoPhaseLayerModes(P, a, kin, kout, 60);
    const r = P / 2 - a;
    const z = (j: number, x: number): number => {
      const mu = modes.wavenumbers[j];
      return Math.abs(x) < a ? modes.innerAmplitude[j] * Math.cos(mu * x) : modes.outerAmplitude[j] * Math.cos(mu * (P / 2 - Math.abs(x)));
    };
    for (let j = 1; j < modes.wavenumbers.length; j++) {
      const mu = modes.wavenumbers[j];
      // Flux continuity: k_in Z'(a−) = k_out Z'(a+).
      const inner = -kin * mu * modes.innerAmplitude[j] * Math.sin(mu * a);
      const outer = kout * mu * modes.outerAmplitude[j] * Math.sin(mu * r);
      expect(Math.abs(inner - outer)).toBeLessThan(1e-9 * (Math.abs(inner) + Math.abs(outer) + mu));
    }
    // Midpoint quadrature on a fine grid (independent of the closed forms).
    const cells = 200_000;
    const h = P / cells;
    for (const [i, j] of [[1, 2], [3, 7], [5, 5]]) {
      let weighted = 0;
      let transform = 0;
      for (let c = 0; c < cells; c++) {
        const x = -P / 2 + (c + 0.5) * h;
        weighted += (Math.abs(x) < a ? kin : kout) * z(i, x) * z(j, x) * h;
        if (i === j) transform += z(i, x) * Math.cos(2 * Math.PI * 3 * x) * h;
      }
      if (i === j) {
        expect(weighted).toBeCloseTo(modes.weightedNorm[i], 6);
        expect(layerModeTransform(modes, i, P, a, 3)).toBeCloseTo(transform, 6);
      } else {
        expect(Math.abs(weighted)).toBeLessThan(1e-6);
      }
    }
  });
});

describe('Euler transformation of alternating tails', () => {
  it('Σ (−1)^m/(m + 1) = ln 2 (classical)', () => {
    const t = Float64Array.from({ length: 40 }, (_, m) => 1 / (m + 1));
    let head = 0;
    for (let m = 0; m < 20; m++) head += (m % 2 === 0 ? 1 : -1) * t[m];
    expect(head + eulerAlternatingTail(t, 20, 12)).toBeCloseTo(Math.LN2, 10);
  });
});
