#!/usr/bin/env python3
"""Tables for the transverse (Stokes) groove-cell slip core, src/physics/groove/groove-cell-transverse.ts.

The problem: 2-D Stokes flow across one period P of a grooved wall, water above under a uniform far
shear, lubricant (viscosity ratio N) in a rectangular groove of width w and depth d, flat interface
at the groove mouth (no penetration; velocity and shear stress continuous), no slip on the solid.
The unknown is the interface velocity U on the mouth, even in x. Galerkin method on the mouth:

    (W(phi) + (N/2) C(d/w)) a = r,   U(s) = (tau w / (4 mu_w)) sum_j a_j g_j(s),  s = 2x/w

with a fixed basis g_j of continuous piecewise polynomials on a mesh graded geometrically towards
the groove edges (hp refinement: exponential convergence whatever the edge exponent, which depends
on N). Both operators are scale invariant, so each depends on one number only:

  W_ij(phi) = <g_i, |K| g_j>, the water side (half space above a periodic line, Fourier mode k gives
      wall shear -2 mu_w |k| u_k; the factor 2 is applied at run time). Computed exactly by the
      conformal map t = tan(pi x/P)/tan(pi phi/2), t = cos(theta), under which the Dirichlet energy
      is invariant and sqrt(1 - t^2) U_{n-1}(t) = sin(n theta) diagonalises the operator with
      eigenvalue n (finite Hilbert transform of Chebyshev polynomials): W = sum_n n (pi/2) c_in c_jn
      with c_jn the sine coefficients of g_j(s(theta)) (type-I discrete sine transform, 2^15 points).
  C_ij(d/w) = energy of the Stokes flows driven in the cavity by the lid velocities g_i, g_j, from
      FreeFEM (Taylor-Hood P2/P1) on a mesh graded towards the lid corners; transverse_cavity.edp.

Also tabulated: r_j = int g_j ds; the mean water-side shear functional m_j(phi) and the centre value
k_j(phi) of |K| g_j (for the interfacial shear); the consistent lid force F_j and the centre lid
shear G_j of each cavity flow; the stream function of each cavity flow on the groove centre line.

Grids: phi uniform in X = ln tan(pi phi/2); d/w uniform in Y = ln(d/w). Cavity quantities are stored
multiplied by D/(1 + D), D = 2d/w (they grow like 1/D in shallow grooves, lubrication), the stream
function divided by min(D, 3). Held-out midpoints go to fixtures/slip/transverse_holdout.json for
the interpolation-error test.

Run (about 30 min on one core):  python3 src/physics/groove/data/generate_transverse_groove_table.py
Requires numpy, scipy and FreeFem++ (Debian: python3-scipy, freefem++).
"""
import json
import math
import os
import subprocess
import sys
import tempfile

import numpy as np
import scipy
import scipy.fft
from numpy.polynomial import legendre as leg

HERE = os.path.dirname(os.path.abspath(__file__))
ROOT = os.path.normpath(os.path.join(HERE, '..', '..', '..'))
CACHE = os.environ.get('TRANSVERSE_CACHE', os.path.join(tempfile.gettempdir(), 'oilskin-transverse-cache'))

SIGMA, LAYERS, PMAX, PMIN = 0.2, 8, 6, 1
DST_POINTS = 2 ** 15
MESH_REFINEMENT = 1.5
PSI_SAMPLES = 17
WATER_X0, WATER_STEP, WATER_COUNT = -4.2, 0.2, 47
CAVITY_Y0, CAVITY_STEP, CAVITY_COUNT = -5.3, 0.25, 27


class MouthBasis:
    """Even, continuous piecewise polynomials on the half mouth 0 <= s <= 1 (groove edge at s = 1),
    vanishing at the edge. Element boundaries 1 - SIGMA^k; degree PMAX in the central element falling
    linearly to PMIN at the edge element. The central element uses q = (s/s1)^2 (smooth at s = 0)."""

    def __init__(self):
        self.nodes = np.array([0.0] + [1 - SIGMA ** k for k in range(1, LAYERS + 1)] + [1.0])
        ne = len(self.nodes) - 1
        self.degrees = [max(PMIN, int(round(PMAX - (PMAX - PMIN) * k / (ne - 1)))) for k in range(ne)]
        self.functions = [(0, 0, 0)] + [(1, k, 0) for k in range(1, ne)]
        for e in range(ne):
            for m in range(2, self.degrees[e] + 1):
                self.functions.append((2, e, m))
        self.n = len(self.functions)

    def _local(self, e, s):
        a, b = self.nodes[e], self.nodes[e + 1]
        if e == 0:
            return s * s / (b * b), 2 * s / (b * b)
        return (s - a) / (b - a), np.full_like(s, 1 / (b - a))

    def value_and_slope(self, j, s):
        s = np.asarray(s, dtype=float)
        sign = np.sign(s)
        s = np.abs(s)
        val = np.zeros_like(s)
        der = np.zeros_like(s)
        kind, k, m = self.functions[j]
        nd = self.nodes
        if kind == 0:
            mask = s <= nd[1]
            xi, dxi = self._local(0, s[mask])
            val[mask], der[mask] = 1 - xi, -dxi
        elif kind == 1:
            m1 = (s >= nd[k - 1]) & (s <= nd[k])
            xi, dxi = self._local(k - 1, s[m1])
            val[m1], der[m1] = xi, dxi
            m2 = (s > nd[k]) & (s <= nd[k + 1])
            xi, dxi = self._local(k, s[m2])
            val[m2], der[m2] = 1 - xi, -dxi
        else:
            mask = (s >= nd[k]) & (s <= nd[k + 1])
            xi, dxi = self._local(k, s[mask])
            c = np.zeros(m - 1)
            c[-1] = 1
            p = leg.legval(2 * xi - 1, c)
            dp = leg.legval(2 * xi - 1, leg.legder(c)) * 2
            val[mask] = xi * (1 - xi) * p
            der[mask] = ((1 - 2 * xi) * p + xi * (1 - xi) * dp) * dxi
        return val, der * sign

    def element_quadrature(self, order=40):
        x, w = leg.leggauss(order)
        for e in range(len(self.nodes) - 1):
            a, b = self.nodes[e], self.nodes[e + 1]
            yield 0.5 * (a + b) + 0.5 * (b - a) * x, 0.5 * (b - a) * w

    def integrals(self):
        r = np.zeros(self.n)
        for s, w in self.element_quadrature():
            for j in range(self.n):
                r[j] += 2 * np.dot(w, self.value_and_slope(j, s)[0])
        return r


def water_node(basis, phi):
    """W (water-side energy matrix), m (mean shear functional), k (centre shear) at interface fraction phi."""
    T = math.tan(math.pi * phi / 2)
    M = DST_POINTS
    theta = np.arange(1, M) * math.pi / M
    s = (2 / (math.pi * phi)) * np.arctan(T * np.cos(theta))
    coeff = np.empty((basis.n, M - 1))
    for j in range(basis.n):
        coeff[j] = scipy.fft.dst(basis.value_and_slope(j, s)[0], type=1) / M
    n = np.arange(1, M)
    W = (coeff * (n * math.pi / 2)) @ coeff.T
    m = np.zeros(basis.n)
    k = np.zeros(basis.n)
    for sq, w in basis.element_quadrature(60):
        log_ratio = np.log(np.sin(math.pi * phi * (1 - sq) / 2)) - np.log(np.sin(math.pi * phi * (1 + sq) / 2))
        cot = 1 / np.tan(math.pi * phi * sq / 2)
        for j in range(basis.n):
            slope = basis.value_and_slope(j, sq)[1]
            m[j] += (2 / math.pi) * np.dot(w, slope * log_ratio)
            k[j] += -phi * np.dot(w, slope * cot)
    return 0.5 * (W + W.T), m, k


def cavity_boundary(basis, D):
    lid, spacing = [], []
    for e in range(len(basis.nodes) - 1):
        a, b = basis.nodes[e], basis.nodes[e + 1]
        length = b - a
        h = min(length / (2 + 3 * basis.degrees[e]), D / 6) / MESH_REFINEMENT
        # FreeFEM rejects boundary points closer than 1e-7 of the domain size (deep cavities)
        h = max(h, 1.5e-7 * max(D, 2.2))
        count = max(2, int(math.ceil(length / h))) * (2 if e == 0 else 1)
        for q in range(count):
            lid.append(a + length * (q / count) ** 2 if e == 0 else a + length * q / count)
        spacing.append(length / count)
    lid.append(1.0)
    lid = np.array(lid)
    hmax = min(D / 6, 0.08) / MESH_REFINEMENT
    dist = np.sort(1 - lid)
    depths = [0.0] + list(dist[(dist > 0) & (dist < min(D, 1) * 0.5)])
    while depths[-1] < D:
        depths.append(depths[-1] + min(hmax, max((depths[-1] - depths[-2]) * 1.2, 1e-12)))
    depths[-1] = D
    if depths[-1] - depths[-2] < 0.3 * (depths[-2] - depths[-3]):
        del depths[-2]
    floor_count = max(6, int(math.ceil(1 / min(hmax, 0.05 / MESH_REFINEMENT))))
    top = min(D, 1.0)
    axis_count = max(6, int(math.ceil(top / min(spacing[0], hmax))))
    pts = [(q / floor_count, -D, 1) for q in range(floor_count)]
    pts += [(1.0, -y, 2) for y in depths[::-1][:-1]]
    pts += [(x, 0.0, 3) for x in lid[::-1][:-1]]
    pts += [(0.0, -top * (q / axis_count) ** 2, 4) for q in range(axis_count)]
    if D > 1:
        rest = max(4, int(math.ceil((D - 1) / hmax)))
        pts += [(0.0, -1 - (D - 1) * q / rest, 4) for q in range(rest)]
    return pts


def psi_depths():
    """Chebyshev-Lobatto points on [0, 1] (fraction of the sampled depth min(D, 3) below the lid)."""
    k = np.arange(PSI_SAMPLES)
    return (1 - np.cos(math.pi * k / (PSI_SAMPLES - 1))) / 2


def run_freefem(script, params):
    """Runs a FreeFEM script in a fresh folder holding params.txt; returns the lines of the out.txt it writes."""
    work = tempfile.mkdtemp(prefix='oilskin-freefem-')
    with open(os.path.join(work, 'params.txt'), 'w') as fh:
        fh.write(params)
    run = subprocess.run(['FreeFem++', '-nw', '-v', '0', script], capture_output=True, text=True, cwd=work)
    if run.returncode != 0:
        raise RuntimeError(run.stdout[-3000:] + run.stderr[-3000:])
    with open(os.path.join(work, 'out.txt')) as fh:
        return fh.read().split('\n')


def cavity_node(basis, depth_over_width):
    D = 2 * depth_over_width
    os.makedirs(CACHE, exist_ok=True)
    key = os.path.join(CACHE, f'cavity_{depth_over_width:.12g}_{MESH_REFINEMENT}_{SIGMA}_{LAYERS}_{PMAX}_{PMIN}.json')
    if os.path.exists(key):
        with open(key) as fh:
            return json.load(fh)
    pts = cavity_boundary(basis, D)
    sample = min(D, 3.0)
    ys = -sample * psi_depths()[::-1]  # ascending from the deepest sample to the lid
    params = f'{len(pts)} {D!r}\n' + ''.join(f'{float(x)!r} {float(y)!r} {lab}\n' for x, y, lab in pts)
    params += f'{len(basis.nodes) - 1}\n' + ' '.join(repr(float(v)) for v in basis.nodes) + '\n'
    params += f'{basis.n}\n' + '\n'.join(f'{a} {b} {c}' for a, b, c in basis.functions) + '\n'
    params += f'{len(ys)}\n' + ' '.join(repr(float(v)) for v in ys) + '\n'
    lines = run_freefem(os.path.join(HERE, 'transverse_cavity.edp'), params)
    n = basis.n
    vertices, triangles, dofs = map(int, lines[0].split())
    row = lambda i: [float(v) for v in lines[i].split()]
    C = 2 * np.array([row(1 + i) for i in range(n)])  # both halves of the cavity
    out = {
        'depthOverWidth': depth_over_width,
        'C': (0.5 * (C + C.T)).tolist(),
        'forceBoundary': (2 * np.array(row(1 + n))).tolist(),
        'force': (2 * np.array(row(2 + n))).tolist(),
        'centreShear': row(3 + n),
        'psi': [row(4 + n + k) for k in range(len(ys))][::-1],  # from the lid down
        'mesh': {'vertices': vertices, 'triangles': triangles, 'dofs': dofs},
    }
    with open(key, 'w') as fh:
        json.dump(out, fh)
    return out


def packed(matrix):
    a = np.asarray(matrix)
    return [a[i, j] for i in range(a.shape[0]) for j in range(i, a.shape[0])]


def rounded(values):
    return [float(f'{v:.13g}') for v in values]


def phi_of(X):
    return 2 / math.pi * math.atan(math.exp(X))


def water_record(basis, X):
    W, m, k = water_node(basis, phi_of(X))
    return {'W': rounded(packed(W)), 'meanShear': rounded(m), 'centreShear': rounded(k)}


def cavity_record(basis, Y):
    node = cavity_node(basis, math.exp(Y))
    D = 2 * math.exp(Y)
    scale = D / (1 + D)
    sample = min(D, 3.0)
    return {
        'C': rounded(packed(np.array(node['C']) * scale)),
        'force': rounded(np.array(node['force']) * scale),
        'centreShear': rounded(np.array(node['centreShear']) * scale),
        'psi': [rounded(np.array(p) / sample) for p in node['psi']],
        'forceBoundary': rounded(np.array(node['forceBoundary']) * scale),
        'mesh': node['mesh'],
    }


def main():
    basis = MouthBasis()
    r = basis.integrals()
    which = sys.argv[1] if len(sys.argv) > 1 else 'all'
    water = [water_record(basis, WATER_X0 + i * WATER_STEP) for i in range(WATER_COUNT)] if which in ('all', 'water') else []
    cavity = []
    if which in ('all', 'cavity'):
        for i in range(CAVITY_COUNT):
            Y = CAVITY_Y0 + i * CAVITY_STEP
            cavity.append(cavity_record(basis, Y))
            print('cavity node', i, math.exp(Y), cavity[-1]['mesh'], flush=True)
    if which != 'all':
        return
    table = {
        'generator': 'src/physics/groove/data/generate_transverse_groove_table.py (+ transverse_cavity.edp)',
        'method': 'Galerkin on the groove mouth; water side exact by conformal map and discrete sine transform; '
                  'cavity side FreeFEM Taylor-Hood P2/P1 on graded meshes',
        'versions': {'numpy': np.__version__, 'scipy': scipy.__version__,
                     'freefem': next((line.strip('- ').strip() for line in subprocess.run(['FreeFem++', '-h'], capture_output=True, text=True).stdout.split('\n') if 'FreeFem++ v' in line), 'unknown')},
        'basis': {'sigma': SIGMA, 'layers': LAYERS, 'degrees': basis.degrees, 'nodes': basis.nodes.tolist(),
                  'functions': basis.functions, 'size': basis.n},
        'rhs': rounded(r),
        'centreValue': [1.0] + [0.0] * (basis.n - 1),
        'water': {'variable': 'X = ln tan(pi phi / 2)', 'start': WATER_X0, 'step': WATER_STEP, 'count': WATER_COUNT,
                  'dstPoints': DST_POINTS, 'nodes': water},
        'cavity': {'variable': 'Y = ln(d / w)', 'start': CAVITY_Y0, 'step': CAVITY_STEP, 'count': CAVITY_COUNT,
                   'scale': 'C, force, centreShear multiplied by D/(1 + D); psi divided by min(D, 3); D = 2 d/w',
                   'psiDepths': rounded(psi_depths()), 'meshRefinement': MESH_REFINEMENT, 'nodes': cavity},
    }
    with open(os.path.join(HERE, 'transverse-groove-table.json'), 'w') as fh:
        json.dump(table, fh, separators=(',', ':'))
    # Held-out midpoints for the interpolation-error test (tests read only this JSON).
    holdout = {'generator': 'src/physics/groove/data/generate_transverse_groove_table.py', 'water': [], 'cavity': []}
    for i in range(2, WATER_COUNT - 3, 6):
        X = WATER_X0 + (i + 0.5) * WATER_STEP
        holdout['water'].append({'X': X, 'interfaceFraction': phi_of(X), **water_record(basis, X)})
    for i in range(1, CAVITY_COUNT - 2, 4):
        Y = CAVITY_Y0 + (i + 0.5) * CAVITY_STEP
        rec = cavity_record(basis, Y)
        rec.pop('psi')
        rec.pop('forceBoundary')
        holdout['cavity'].append({'Y': Y, 'depthOverWidth': math.exp(Y), **rec})
    with open(os.path.join(ROOT, 'fixtures', 'slip', 'transverse_holdout.json'), 'w') as fh:
        json.dump(holdout, fh, separators=(',', ':'))


if __name__ == '__main__':
    main()
