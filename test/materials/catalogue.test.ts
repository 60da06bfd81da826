import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../src/core/errors.js';
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

  it('lists n-alkane surface tensions at 20 °C as printed by Jasper (1972): 23.83, 25.35, 27.47 mN/m (from memory)', () => {
    const at20 = (id: string) => getFluid(id)!.properties.surfaceTension!.at(293.15) * 1e3;
    expect(at20('n-decane')).toBeCloseTo(23.83, 1);
    expect(at20('n-dodecane')).toBeCloseTo(25.35, 1);
    expect(at20('n-hexadecane')).toBeCloseTo(27.47, 1);
  });

  it('gives n-alkane densities at 20 °C within 0.3 % of the CRC Handbook values 730.0, 749.5, 773.3 kg/m³ (from memory)', () => {
    const at20 = (id: string) => getFluid(id)!.properties.density!.at(293.15);
    expect(Math.abs(at20('n-decane') / 730.0 - 1)).toBeLessThan(0.003);
    expect(Math.abs(at20('n-dodecane') / 749.5 - 1)).toBeLessThan(0.003);
    expect(Math.abs(at20('n-hexadecane') / 773.3 - 1)).toBeLessThan(0.003);
  });

  it('gives n-alkane viscosities at 25 °C within 3 % of the CRC Handbook values 0.838, 1.383, 3.032 mPa·s (from memory)', () => {
    const at25 = (id: string) => getFluid(id)!.properties.viscosity!.at(298.15) * 1e3;
    expect(Math.abs(at25('n-decane') / 0.838 - 1)).toBeLessThan(0.03);
    expect(Math.abs(at25('n-dodecane') / 1.383 - 1)).toBeLessThan(0.03);
    expect(Math.abs(at25('n-hexadecane') / 3.032 - 1)).toBeLessThan(0.03);
  });

  it('makes alkane viscosity fall and density fall with temperature (physical monotonicity)', () => {
    for (const id of ['n-decane', 'n-dodecane', 'n-hexadecane']) {
      const fluid = getFluid(id)!;
      expect(fluid.properties.viscosity!.at(350)).toBeLessThan(fluid.properties.viscosity!.at(300));
      expect(fluid.properties.density!.at(350)).toBeLessThan(fluid.properties.density!.at(300));
    }
  });

  it('the Fowkes estimate from the catalogue hexadecane/water values falls near 51 mN/m, below the listed measured 52–54 mN/m (physics design check, from memory)', () => {
    const water = resolveFluid({ id: 'water', temperature: 298.15 });
    const oil = resolveFluid({ id: 'n-hexadecane', temperature: 298.15 });
    const estimate =
      water.surfaceTension! + oil.surfaceTension! - 2 * Math.sqrt(water.surfaceTensionDispersive! * oil.surfaceTensionDispersive!);
    expect(estimate * 1e3).toBeGreaterThan(49);
    expect(estimate * 1e3).toBeLessThan(52);
    expect(oil.interfacialTensionWater! * 1e3).toBeGreaterThan(52);
    expect(oil.interfacialTensionWater! * 1e3).toBeLessThan(54);
  });
});

describe('catalogueListing', () => {
  const listing = catalogueListing();

  it('describes every fluid and survives a JSON round trip unchanged', () => {
    expect(listing.map((f) => f.id)).toEqual(fluidIds());
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
        expect(property!.source.key).toBe(record.source.key);
        expect(property!.source.citation).toBe(record.source.citation);
      }
    }
  });

  it('lists water at 20 °C with the IAPWS density 998.21 kg/m³ (task value) and a DOI for its source', () => {
    const water = listing.find((f) => f.id === 'water')!;
    expect(water.properties.density!.value).toBeCloseTo(998.21, 2);
    expect(water.properties.density!.source.doi).toBe('10.1063/1.3043575');
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
