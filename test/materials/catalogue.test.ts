import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../src/core/errors.js';
import { RECALLED_TAG } from '../../src/materials/records.js';
import {
  FLUIDS,
  PROPERTY_UNITS,
  catalogueListing,
  fluidIds,
  getFluid,
  resolveFluid,
  waterDensity,
  waterViscosity,
} from '../../src/materials/index.js';
import type { FluidPropertyName } from '../../src/core/fluid.js';

function domainError(run: () => unknown): DomainError {
  try {
    run();
  } catch (error) {
    if (error instanceof DomainError) return error;
    throw error;
  }
  throw new Error('expected a DomainError');
}

describe('catalogue contents', () => {
  it('holds the fluids the task requires, with unique kebab-case ids', () => {
    const ids = fluidIds();
    for (const id of [
      'water',
      'seawater',
      'n-decane',
      'n-dodecane',
      'n-hexadecane',
      'silicone-oil-5cst',
      'silicone-oil-10cst',
      'silicone-oil-20cst',
      'silicone-oil-50cst',
      'silicone-oil-100cst',
      'silicone-oil-1000cst',
      'pfpe-generic',
      'perfluorodecalin',
      'mineral-oil-light',
      'gallium',
    ]) {
      expect(ids).toContain(id);
    }
    expect(new Set(ids).size).toBe(ids.length);
    for (const id of ids) expect(id).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
    expect(getFluid('water')?.role).toBe('working-fluid');
    expect(getFluid('no-such-fluid')).toBeUndefined();
  });

  it('gives every property a source with key and citation, and a valid range of positive width', () => {
    for (const fluid of FLUIDS) {
      expect(fluid.properties.density).toBeDefined();
      expect(fluid.properties.viscosity).toBeDefined();
      for (const record of Object.values(fluid.properties)) {
        expect(record!.source.key.length).toBeGreaterThan(0);
        expect(record!.source.citation.length).toBeGreaterThan(20);
        expect(record!.validRange.max).toBeGreaterThan(record!.validRange.min);
      }
    }
  });

  it('gives every lubricant a safety line', () => {
    for (const fluid of FLUIDS.filter((f) => f.role === 'lubricant')) {
      expect(fluid.safety ?? '').toMatch(/safety data sheet|SDS/);
    }
  });

  it('evaluates every property finite and positive across its valid range (property-based sweep)', () => {
    for (const fluid of FLUIDS) {
      for (const [name, record] of Object.entries(fluid.properties)) {
        const low = Math.max(record!.validRange.min, fluid.freezingPoint ?? -Infinity);
        const high = Math.min(record!.validRange.max, fluid.boilingPoint ?? Infinity);
        if (!(high > low)) continue;
        fc.assert(
          fc.property(fc.double({ min: low, max: high, noNaN: true }), (temperature) => {
            const value = record!.at(temperature);
            return Number.isFinite(value) && value > 0;
          }),
          { numRuns: 200 },
        );
        expect(name in PROPERTY_UNITS).toBe(true);
      }
    }
  });

  it('keeps the dispersive component at or below the total surface tension where both are listed', () => {
    for (const fluid of FLUIDS) {
      const total = fluid.properties.surfaceTension;
      const dispersive = fluid.properties.surfaceTensionDispersive;
      if (total === undefined || dispersive === undefined) continue;
      const t = fluid.referenceTemperature;
      expect(dispersive.at(t)).toBeLessThanOrEqual(total.at(t) + 1e-15);
    }
  });

  // Independent witnesses for the alkane values: the JPCRD reference correlations of Mulero, Cachadiña & Parra
  // (2012, J. Phys. Chem. Ref. Data 41, 043105, doi 10.1063/1.4768782) for surface tension, and the VDI Heat Atlas
  // (2nd ed., Springer 2010) PPDS correlations for density, viscosity and conductivity; coefficients as transcribed
  // in the open-source chemicals library (Mulero: σ = Σ σ_i (1 − T/Tc)^n_i; PPDS density
  // ρ = ρc + A τ^0.35 + B τ^(2/3) + C τ + D τ^(4/3), τ = 1 − T/Tc; PPDS 9 viscosity
  // μ = E exp[A r^(1/3) + B r^(4/3)], r = (C − T)/(T − D); conductivity a polynomial in T).
  const mulero = (t: number, tc: number, terms: [number, number][]) => terms.reduce((sum, [s, n]) => sum + s * (1 - t / tc) ** n, 0);
  const ppdsDensity = (t: number, [tc, rhoc, a, b, c, d]: number[]) => {
    const tau = 1 - t / tc;
    return rhoc + a * tau ** 0.35 + b * tau ** (2 / 3) + c * tau + d * tau ** (4 / 3);
  };
  const ppdsViscosity = (t: number, [a, b, c, d, e]: number[]) => {
    const r = (c - t) / (t - d);
    return e * Math.exp(a * Math.cbrt(r) + b * r * Math.cbrt(r));
  };
  const polynomial = (t: number, coefficients: number[]) => coefficients.reduce((sum, c, i) => sum + c * t ** i, 0);
  const VDI_PPDS: Record<string, { density: number[]; viscosity: number[]; conductivity: number[] }> = {
    'n-decane': {
      density: [617.7, 234, 309.6055, 987.2944, -1482.3904, 909.4231],
      viscosity: [2.7681, 0.64646, 621.362, 24.17, 2.107e-5],
      conductivity: [0.2084, -0.0002784, 1.39e-7, -2.98e-10, 2.34e-13],
    },
    'n-dodecane': {
      density: [658.1, 238, 444.404, 138.4886, 69.0787, 37.5477],
      viscosity: [1.87106, 0.59429, 757.672, 63.871, 3.07e-5],
      conductivity: [0.1994, -0.0001715, -2.59e-7, 4.8e-10, -3.3e-13],
    },
    'n-hexadecane': {
      density: [723.05, 240, 452.8468, -20.7559, 361.8764, -90.6718],
      viscosity: [1.75863, 0.59899, 1140.067, 17.721, 1.758e-5],
      conductivity: [0.2106, -0.000243, 6e-8, -5.9e-11, 1.7e-14],
    },
  };

  it('gives n-decane and n-dodecane surface tensions at 20 °C within 0.3 % of the Mulero et al. (2012) JPCRD correlations (23.86, 25.39 mN/m), n-hexadecane within 1 % of the VDI Heat Atlas PPDS value (27.61 mN/m)', () => {
    const at20 = (id: string) => getFluid(id)!.properties.surfaceTension!.at(293.15);
    expect(Math.abs(at20('n-decane') / mulero(293.15, 617.7, [[0.05473, 1.29]]) - 1)).toBeLessThan(0.003);
    expect(Math.abs(at20('n-dodecane') / mulero(293.15, 658.1, [[0.0154, 4.18], [0.048, 1.17]]) - 1)).toBeLessThan(0.003);
    expect(Math.abs(at20('n-hexadecane') / mulero(293.15, 723.05, [[0.05742, 1.40834]]) - 1)).toBeLessThan(0.01);
  });

  it('gives n-alkane densities within 0.3 % and thermal conductivities within 0.5 % of the VDI Heat Atlas PPDS correlations from 20 to 80 °C', () => {
    for (const [id, vdi] of Object.entries(VDI_PPDS)) {
      const fluid = getFluid(id)!;
      for (const t of [293.15, 323.15, 353.15]) {
        expect(Math.abs(fluid.properties.density!.at(t) / ppdsDensity(t, vdi.density) - 1)).toBeLessThan(0.003);
        expect(Math.abs(fluid.properties.thermalConductivity!.at(t) / polynomial(t, vdi.conductivity) - 1)).toBeLessThan(0.005);
      }
    }
  });

  it('gives n-alkane viscosities within 5 % of the VDI Heat Atlas PPDS correlations from 20 to 80 °C (the two handbooks differ by up to 4.3 %, decane at 80 °C)', () => {
    for (const [id, vdi] of Object.entries(VDI_PPDS)) {
      const fluid = getFluid(id)!;
      for (const t of [293.15, 323.15, 353.15]) {
        expect(Math.abs(fluid.properties.viscosity!.at(t) / ppdsViscosity(t, vdi.viscosity) - 1)).toBeLessThan(0.05);
      }
    }
  });

  it('states n-alkane flash points that rise with chain length and bracket n-dodecane between the DIPPR values of n-undecane (339.05 K) and n-tridecane (363.15 K) (Serat et al. 2017, Fluid Phase Equilib. 449, 52, DIPPR data as transcribed in the chemicals library)', () => {
    const flash = (id: string) => Number(/flash point about ([\d.]+) °C/.exec(getFluid(id)!.safety ?? '')![1]) + 273.15;
    expect(flash('n-dodecane')).toBeGreaterThan(339.05);
    expect(flash('n-dodecane')).toBeLessThan(363.15);
    expect(flash('n-decane')).toBeLessThan(flash('n-dodecane'));
    expect(flash('n-dodecane')).toBeLessThan(flash('n-hexadecane'));
    expect(getFluid('n-dodecane')!.safety).not.toContain(RECALLED_TAG);
  });

  it('makes alkane viscosity fall and density fall with temperature (physical monotonicity)', () => {
    for (const id of ['n-decane', 'n-dodecane', 'n-hexadecane']) {
      const fluid = getFluid(id)!;
      expect(fluid.properties.viscosity!.at(350)).toBeLessThan(fluid.properties.viscosity!.at(300));
      expect(fluid.properties.density!.at(350)).toBeLessThan(fluid.properties.density!.at(300));
    }
  });

  it('the Fowkes estimate from the catalogue hexadecane/water values falls near 51 mN/m, below the measured 53.5 mN/m the catalogue lists (Wu & Hornof 1999, abstract)', () => {
    const water = resolveFluid({ id: 'water', temperature: 298.15 });
    const oil = resolveFluid({ id: 'n-hexadecane', temperature: 298.15 });
    const estimate =
      water.surfaceTension! + oil.surfaceTension! - 2 * Math.sqrt(water.surfaceTensionDispersive! * oil.surfaceTensionDispersive!);
    expect(estimate * 1e3).toBeGreaterThan(49);
    expect(estimate * 1e3).toBeLessThan(52);
    expect(oil.interfacialTensionWater! * 1e3).toBeCloseTo(53.5, 10);
    expect(oil.origins.interfacialTensionWater).toBe('wu-hornof1999');
    expect(estimate).toBeLessThan(oil.interfacialTensionWater!);
  });
});

describe('catalogueListing', () => {
  const { fluids: listing, references } = catalogueListing();

  it('lists the reference of every source key a description or safety note names (flash points, safety mechanisms, pharmacopoeia)', () => {
    const keys = new Set(references.map((r) => r.key));
    for (const key of ['serat2017', 'iec60079-20-1-2010', 'astm-d7094-dodecane', 'pacansky-waltman1997', 'xu2012-gallium-oxide', 'usp32-light-mineral-oil']) {
      expect(keys.has(key), key).toBe(true);
    }
    for (const entry of listing) {
      for (const match of `${entry.description} ${entry.safety ?? ''}`.matchAll(/\(([a-z][a-z0-9-]*\d[a-z0-9-]*)\)/g)) {
        expect(keys.has(match[1]), `${entry.id}: ${match[1]}`).toBe(true);
      }
    }
  });

  it('describes every fluid and survives a JSON round trip unchanged', () => {
    expect(listing.map((f) => f.id)).toEqual(fluidIds());
    expect(JSON.parse(JSON.stringify(references))).toEqual(references);
    expect(JSON.parse(JSON.stringify(listing))).toEqual(listing);
  });

  it('gives each property its value at the reference temperature, unit, valid range and source', () => {
    for (const entry of listing) {
      const fluid = getFluid(entry.id)!;
      expect(entry.referenceTemperature).toBe(fluid.referenceTemperature);
      for (const [name, property] of Object.entries(entry.properties)) {
        const record = fluid.properties[name as FluidPropertyName]!;
        expect(property!.value).toBe(record.at(fluid.referenceTemperature));
        expect(property!.unit).toBe(PROPERTY_UNITS[name as FluidPropertyName]);
        expect(property!.validRange).toEqual(record.validRange);
        expect(property!.source).toBe(record.source.key);
        expect(references.find((r) => r.key === property!.source)?.citation).toBe(record.source.citation);
      }
    }
  });

  it('lists water at 20 °C with the IAPWS density 998.21 kg/m³ (task value) and a DOI for its source', () => {
    const water = listing.find((f) => f.id === 'water')!;
    expect(water.properties.density!.value).toBeCloseTo(998.21, 2);
    expect(references.find((r) => r.key === water.properties.density!.source)?.doi).toBe('10.1063/1.3043575');
    expect(water.freezingPoint).toBe(273.15);
  });
});

describe('resolveFluid', () => {
  it('resolves water at 80 °C from IAPWS with origins and references', () => {
    const state = resolveFluid({ id: 'water', temperature: 353.15 });
    expect(state.id).toBe('water');
    expect(state.density).toBeCloseTo(971.8, 1); // task value, IAPWS
    expect(state.viscosity).toBe(waterViscosity(353.15));
    expect(state.origins.density).toBe('iapws-sr6-08');
    expect(state.origins.viscosity).toBe('iapws-r12-08');
    const keys = state.references.map((r) => r.key);
    expect(keys).toEqual(expect.arrayContaining(['iapws-sr6-08', 'iapws-r12-08', 'iapws-r15-11', 'iapws-r1-76-2014', 'fowkes1964']));
    expect(new Set(keys).size).toBe(keys.length);
  });

  it('uses the reference temperature when none is given', () => {
    const state = resolveFluid({ id: 'water' });
    expect(state.temperature).toBe(293.15);
    expect(state.density).toBe(waterDensity(293.15));
    expect(state.warnings).toEqual([]);
  });

  it('rejects n-hexadecane below its freezing point (18.2 °C) with a DomainError on the temperature', () => {
    const error = domainError(() => resolveFluid({ id: 'n-hexadecane', temperature: 283.15 }, 'lubricant'));
    expect(error.field).toBe('lubricant.temperature');
    expect(error.message).toBe('n-hexadecane freezes at 18.2 °C; requested 10 °C');
  });

  it('rejects water above its normal boiling point and below 0 °C', () => {
    expect(domainError(() => resolveFluid({ id: 'water', temperature: 393.15 })).field).toBe('fluid.temperature');
    expect(domainError(() => resolveFluid({ id: 'water', temperature: 270 })).field).toBe('fluid.temperature');
  });

  it('rejects an unknown id naming the fluid field and listing the known ids', () => {
    const error = domainError(() => resolveFluid({ id: 'unobtainium' }, 'workingFluid'));
    expect(error.field).toBe('workingFluid.id');
    expect(error.message).toContain('n-hexadecane');
  });

  it('lets explicit values override the catalogue and records them as input', () => {
    const state = resolveFluid({ id: 'n-decane', density: 735, interfacialTensionWater: 0.05 });
    expect(state.density).toBe(735);
    expect(state.origins.density).toBe('input');
    expect(state.interfacialTensionWater).toBe(0.05);
    expect(state.origins.interfacialTensionWater).toBe('input');
    expect(state.origins.viscosity).toBe('perry2008-table2-313');
  });

  it('adds a value the catalogue lacks when given (perfluorodecalin has no listed conductivity)', () => {
    const state = resolveFluid({ id: 'perfluorodecalin', thermalConductivity: 0.06 });
    expect(state.thermalConductivity).toBe(0.06);
    expect(state.origins.thermalConductivity).toBe('input');
  });

  it('requires density and viscosity for a custom fluid, naming the missing field', () => {
    expect(domainError(() => resolveFluid({ viscosity: 1e-3 }, 'lubricant')).field).toBe('lubricant.density');
    expect(domainError(() => resolveFluid({ density: 900 }, 'lubricant')).field).toBe('lubricant.viscosity');
    const custom = resolveFluid({ density: 900, viscosity: 0.01, surfaceTension: 0.02 });
    expect(custom).toMatchObject({ id: 'custom', density: 900, viscosity: 0.01, surfaceTension: 0.02, temperature: 293.15 });
    expect(custom.origins).toEqual({ density: 'input', viscosity: 'input', surfaceTension: 'input' });
    expect(custom.references).toEqual([]);
  });

  it('rejects non-positive or non-finite values, naming the field', () => {
    expect(domainError(() => resolveFluid({ id: 'water', density: -1 })).field).toBe('fluid.density');
    expect(domainError(() => resolveFluid({ id: 'water', viscosity: Number.NaN })).field).toBe('fluid.viscosity');
    expect(domainError(() => resolveFluid({ id: 'water', temperature: Infinity })).field).toBe('fluid.temperature');
    expect(domainError(() => resolveFluid({ id: 'seawater', salinity: -3 })).field).toBe('fluid.salinity');
  });

  it('rejects a dispersive component larger than the surface tension', () => {
    const error = domainError(() => resolveFluid({ id: 'n-decane', surfaceTensionDispersive: 0.03 }));
    expect(error.field).toBe('fluid.surfaceTensionDispersive');
  });

  it('warns (property-extrapolated) inside freezing..boiling but outside a valid range, still giving the value', () => {
    const state = resolveFluid({ id: 'n-decane', temperature: 353.15 });
    expect(state.interfacialTensionWater).toBe(52.0e-3);
    const extrapolated = state.warnings.filter((w) => w.code === 'property-extrapolated');
    expect(extrapolated.map((w) => w.message.split(' ')[0])).toEqual(['interfacialTensionWater']);
    expect(extrapolated[0].severity).toBe('caution');
  });

  it('resolves seawater at the default 35 g/kg and at a given salinity, citing the TEOS-10 salinity scale', () => {
    const standard = resolveFluid({ id: 'seawater', temperature: 293.15 });
    expect(standard.density).toBeCloseTo(1024.64, 1); // TEOS-10 (gsw) at S_A = 35 g/kg
    expect(standard.references.map((r) => r.key)).toContain('teos10-2010');
    const brackish = resolveFluid({ id: 'seawater', temperature: 293.15, salinity: 10 });
    expect(brackish.density).toBeLessThan(standard.density);
    expect(brackish.name).toContain('10 g/kg');
    // S = 0 reduces EOS-80 to its pure-water term (SMOW), within 0.01 kg/m³ of IAPWS at 20 °C.
    expect(Math.abs(resolveFluid({ id: 'seawater', temperature: 293.15, salinity: 0 }).density - waterDensity(293.15))).toBeLessThan(0.01);
  });

  it('lets brine freeze lower: 40 g/kg seawater at −2.1 °C resolves, 35 g/kg at −2.1 °C is frozen', () => {
    expect(resolveFluid({ id: 'seawater', temperature: 271.05, salinity: 40 }).temperature).toBe(271.05);
    expect(domainError(() => resolveFluid({ id: 'seawater', temperature: 271.05 })).field).toBe('fluid.temperature');
  });

  it('warns when salinity is outside a correlation range and when it is given for a fluid that ignores it', () => {
    const hyper = resolveFluid({ id: 'seawater', temperature: 300, salinity: 60 });
    expect(hyper.warnings.map((w) => w.code)).toContain('salinity-extrapolated');
    const water = resolveFluid({ id: 'water', salinity: 35 });
    expect(water.warnings.map((w) => w.code)).toContain('salinity-ignored');
  });

  it('seawater at any salinity 0–999 g/kg and any allowed temperature gives finite positive values or a DomainError (property-based)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 999, noNaN: true }), fc.double({ min: 200, max: 380, noNaN: true }), (salinity, temperature) => {
        try {
          const state = resolveFluid({ id: 'seawater', salinity, temperature });
          const numbers = [state.density, state.viscosity, state.surfaceTension, state.thermalConductivity, state.specificHeat];
          return numbers.every((v) => v === undefined || (Number.isFinite(v) && v > 0));
        } catch (error) {
          return error instanceof DomainError && error.field === 'fluid.temperature';
        }
      }),
      { numRuns: 300 },
    );
  });

  it('never returns a non-finite number for any catalogue fluid at any allowed temperature (property-based)', () => {
    for (const fluid of FLUIDS) {
      const low = fluid.freezingPoint ?? 150;
      const high = fluid.boilingPoint ?? 600;
      fc.assert(
        fc.property(fc.double({ min: low, max: high, noNaN: true }), (temperature) => {
          const state = resolveFluid({ id: fluid.id, temperature });
          const numbers = [state.density, state.viscosity, state.surfaceTension, state.thermalConductivity, state.specificHeat];
          return numbers.every((v) => v === undefined || (Number.isFinite(v) && v > 0));
        }),
        { numRuns: 100 },
      );
    }
  });
});
