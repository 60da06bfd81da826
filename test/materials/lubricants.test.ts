import { describe, expect, it } from 'vitest';
import { DomainError } from '../../src/core/errors.js';
import { RECALLED_TAG } from '../../src/materials/records.js';
import { catalogueListing, getFluid, resolveFluid } from '../../src/materials/index.js';

const celsius = (t: number) => 273.15 + t;
const relative = (a: number, b: number) => Math.abs(a / b - 1);

describe('silicone oils (polydimethylsiloxane grades)', () => {
  // Melinder, Å. (2010), Properties of Secondary Working Fluids for Indirect Systems, IIF-IIR: fits for
  // polydimethylsiloxane fluid no. 1, −80…100 °C, T in K, as transcribed in the CoolProp library:
  //   μ = exp(6.36183 − 0.0636352 T + 7.51428e-5 T²) Pa·s,  ρ = 1172.35 − 0.9025 T kg/m³.
  const melinderViscosity = (t: number) => Math.exp(6.36183 - 0.0636352 * t + 7.51428e-5 * t * t);
  const melinderDensity = (t: number) => 1172.35 - 0.9025 * t;
  // The same handbook's polydimethylsiloxane fluid no. 2: μ = exp(5.66926 − 0.065582 T + 8.09988e-5 T²) Pa·s.
  const melinderViscosity2 = (t: number) => Math.exp(5.66926 - 0.065582 * t + 8.09988e-5 * t * t);

  it('gives the 10 cSt grade at 0 °C and 60 °C the viscosity of the published relation (Melinder 2010) scaled from its 25 °C value', () => {
    const viscosity = getFluid('silicone-oil-10cst')!.properties.viscosity!;
    const at25 = viscosity.at(298.15);
    // Definition of the grade: 10 mm²/s at 25 °C, times the catalogue density at 25 °C.
    expect(at25).toBeCloseTo(10e-6 * getFluid('silicone-oil-10cst')!.properties.density!.at(298.15), 15);
    for (const t of [celsius(0), celsius(60)]) {
      expect(relative(viscosity.at(t) / at25, melinderViscosity(t) / melinderViscosity(298.15))).toBeLessThan(1e-12);
    }
    // Magnitudes: 1.678 times the 25 °C value at 0 °C, 0.567 times at 60 °C (computed from the relation).
    expect(viscosity.at(celsius(0)) / at25).toBeCloseTo(1.678, 3);
    expect(viscosity.at(celsius(60)) / at25).toBeCloseTo(0.5673, 3);
  });

  it("uses a temperature dependence within 7 % of the same handbook's second polydimethylsiloxane fluid between 0 and 60 °C (the relation is not peculiar to one fluid)", () => {
    const viscosity = getFluid('silicone-oil-50cst')!.properties.viscosity!;
    for (const t of [celsius(0), celsius(60)]) {
      const ours = viscosity.at(t) / viscosity.at(298.15);
      const other = melinderViscosity2(t) / melinderViscosity2(298.15);
      expect(relative(ours, other)).toBeLessThan(0.07);
      expect(relative(ours, other)).toBeGreaterThan(0.01); // the two fluids do differ: the check is not vacuous
    }
  });

  it('expands with temperature as the handbook fluid does: ρ(0 °C)/ρ(60 °C) = 1.0621 for every grade', () => {
    const expected = melinderDensity(celsius(0)) / melinderDensity(celsius(60));
    expect(expected).toBeCloseTo(1.0621, 4);
    for (const grade of [5, 10, 20, 50, 100, 1000]) {
      const density = getFluid(`silicone-oil-${grade}cst`)!.properties.density!;
      expect(density.at(celsius(0)) / density.at(celsius(60))).toBeCloseTo(expected, 12);
    }
  });

  it('follows the surface-tension fit of Darhuber et al. (2003): 21.5 mN/m at 0 °C, 17.9 mN/m at 60 °C', () => {
    const tension = getFluid('silicone-oil-20cst')!.properties.surfaceTension!;
    expect(tension.at(celsius(0)) * 1e3).toBeCloseTo(21.5, 10);
    expect(tension.at(celsius(60)) * 1e3).toBeCloseTo(17.9, 10);
  });

  it('has a surface-tension temperature coefficient within 15 % of that of tetradecamethylhexasiloxane at 25 °C (0.068 mN/(m·K), Mulero et al. 2012 JPCRD correlation σ = 40.798 (1 − T/653.2)^1.3323 mN/m)', () => {
    const oligomer = (t: number) => 40.798e-3 * (1 - t / 653.2) ** 1.3323;
    const oligomerSlope = (oligomer(299.15) - oligomer(297.15)) / 2;
    const tension = getFluid('silicone-oil-5cst')!.properties.surfaceTension!;
    const slope = (tension.at(299.15) - tension.at(297.15)) / 2;
    expect(oligomerSlope * 1e3).toBeCloseTo(-0.068, 3);
    expect(relative(slope, oligomerSlope)).toBeLessThan(0.15);
  });

  it('resolves at 0, 10 and 60 °C (cold sea water, cooling water) without any extrapolation caution', () => {
    for (const t of [0, 10, 60]) {
      for (const grade of [5, 1000]) {
        const state = resolveFluid({ id: `silicone-oil-${grade}cst`, temperature: celsius(t) });
        expect(state.warnings).toEqual([]);
        expect(state.specificHeat).toBeGreaterThan(0);
      }
    }
  });

  it('gives conductivity falling and heat capacity rising with temperature, as the handbook fluid (1666 J/(kg·K) at 25 °C: 1223.69 + 1.48417 T)', () => {
    const oil = getFluid('silicone-oil-100cst')!.properties;
    expect(oil.thermalConductivity!.at(celsius(60))).toBeLessThan(oil.thermalConductivity!.at(celsius(0)));
    expect(oil.specificHeat!.at(298.15)).toBeCloseTo(1223.69 + 1.48417 * 298.15, 9);
  });

  // DIPPR flash points as transcribed in the chemicals library (Serat et al. 2017, Fluid Phase Equilib. 449, 52):
  // octamethyltrisiloxane 299.99 K, hexacosamethyldodecasiloxane 455.50 K.
  it('gives no flash point for a grade, only the DIPPR range of the linear oligomers, 27 to 182 °C (Serat et al. 2017)', () => {
    for (const grade of [5, 1000]) {
      const safety = getFluid(`silicone-oil-${grade}cst`)!.safety ?? '';
      expect(safety).toContain(`from ${Math.round(299.99 - 273.15)} °C (octamethyltrisiloxane)`);
      expect(safety).toContain(`${Math.round(455.5 - 273.15)} °C (hexacosamethyldodecasiloxane`);
      expect(safety).toContain('serat2017');
      expect(safety).not.toMatch(/flash point about/);
    }
  });

  it('names the grades generically ("Polydimethylsiloxane, 10 cSt")', () => {
    expect(getFluid('silicone-oil-10cst')!.name).toBe('Polydimethylsiloxane, 10 cSt (silicone oil)');
  });
});

describe('liquid gallium (conductive lubricant)', () => {
  const gallium = getFluid('gallium')!;

  // Assael et al. (2012), J. Phys. Chem. Ref. Data, doi 10.1063/1.4729873: gallium density ρ = 6077 − 0.611 (T − 302.914 K)
  // kg/m³ and viscosity log₁₀(η/mPa·s) = −0.4465 + 204.03 K/T (Eq. 2, Table 5), coefficients as transcribed in the
  // thermolib package. Independent witness for the density: the CRC Handbook molten-element line 6080 − 0.62 (T − 302.916 K).
  it('has the reference-correlation density of Assael et al. (2012): 6077 kg/m³ at the melting point, 6034.1 kg/m³ at 100 °C', () => {
    expect(gallium.properties.density!.at(302.914)).toBeCloseTo(6077, 9);
    expect(gallium.properties.density!.at(373.15)).toBeCloseTo(6077 - 0.611 * (373.15 - 302.914), 9);
  });

  it('agrees with the CRC Handbook molten-gallium density within 0.1 % from 303 to 600 K (independent handbook)', () => {
    const crc = (t: number) => 6080 - 0.62 * (t - 302.916);
    for (const t of [303, 350, 400, 500, 600]) {
      expect(relative(gallium.properties.density!.at(t), crc(t))).toBeLessThan(1e-3);
    }
  });

  it('has the reference-correlation viscosity of Assael et al. (2012): 10^(−0.4465 + 204.03/T) mPa·s, 1.643 mPa·s at 35 °C', () => {
    const viscosity = gallium.properties.viscosity!;
    for (const t of [celsius(35), celsius(100), 700]) {
      expect(relative(viscosity.at(t), 1e-3 * 10 ** (-0.4465 + 204.03 / t))).toBeLessThan(1e-12);
    }
    expect(viscosity.at(celsius(35)) * 1e3).toBeCloseTo(1.643, 3);
    expect(viscosity.validRange).toEqual({ min: 304, max: 800 });
    expect(viscosity.note ?? '').not.toContain(RECALLED_TAG);
  });

  it('refuses a temperature below its melting point, 29.76 °C (CRC; the ITS-90 gallium point 302.9146 K)', () => {
    let error: unknown;
    try {
      resolveFluid({ id: 'gallium', temperature: celsius(20) }, 'lubricant');
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(DomainError);
    expect((error as DomainError).field).toBe('lubricant.temperature');
    expect((error as DomainError).message).toBe('gallium freezes at 29.8 °C; requested 20 °C');
  });

  // Assael et al. (2017), High Temp. High Press. 46, 391 (PMC5772911): λ = 28.403 + 0.071896 (T − 302.914 K) W/(m·K),
  // 303–850 K, as transcribed in the thermolib package. Independent witness: the Wiedemann–Franz law k = L₀σT with the
  // Sommerfeld Lorenz number L₀ = (π²/3)(k_B/e)² = 2.443e-8 W·Ω/K² and the electrical conductivity of liquid gallium at
  // 30 °C, 3.68e6 S/m (Lange's Handbook of Chemistry, 16th ed., as transcribed in the chemicals library).
  it('has the reference-correlation thermal conductivity of Assael et al. (2017): 28.42 W/(m·K) at 30 °C, 33.45 at 100 °C', () => {
    const conductivity = gallium.properties.thermalConductivity!;
    expect(conductivity.at(303.15)).toBeCloseTo(28.403 + 0.071896 * (303.15 - 302.914), 10);
    expect(conductivity.at(373.15)).toBeCloseTo(33.453, 3);
    expect(conductivity.validRange).toEqual({ min: 303, max: 850 });
  });

  it('agrees with the Wiedemann–Franz law at 30 °C within 5 % (27.25 against 28.42 W/(m·K))', () => {
    const lorenz = ((Math.PI ** 2) / 3) * (1.380649e-23 / 1.602176634e-19) ** 2;
    expect(lorenz).toBeCloseTo(2.443e-8, 11);
    const wiedemannFranz = lorenz * 3.68e6 * 303.15;
    expect(wiedemannFranz).toBeCloseTo(27.25, 2);
    const catalogue = gallium.properties.thermalConductivity!.at(303.15);
    expect(relative(catalogue, wiedemannFranz)).toBeLessThan(0.05);
    expect(relative(catalogue, wiedemannFranz)).toBeGreaterThan(0.01); // two independent routes, not one number twice
  });

  it('conducts heat more than 100 times better than any oil in the catalogue (its reason to be there)', () => {
    const k = resolveFluid({ id: 'gallium', temperature: celsius(35) }).thermalConductivity!;
    for (const id of ['n-dodecane', 'silicone-oil-1000cst', 'pfpe-generic']) {
      const oil = resolveFluid({ id: id }).thermalConductivity!;
      expect(k / oil).toBeGreaterThan(100);
    }
  });

  it('has the NIST-JANAF liquid heat capacity: 28.493 J/(mol·K) at 302.92 K and 27.719 at 350 K, over 69.723 g/mol', () => {
    expect(gallium.properties.specificHeat!.at(302.92)).toBeCloseTo(28.493 / 0.069723, 9);
    expect(gallium.properties.specificHeat!.at(350)).toBeCloseTo(27.719 / 0.069723, 9);
    expect(gallium.properties.specificHeat!.at(325)).toBeGreaterThan(27.719 / 0.069723);
  });

  it('lists no surface or interfacial tension (oxide skin) and warns about aluminium and expansion on freezing', () => {
    expect(gallium.properties.surfaceTension).toBeUndefined();
    expect(gallium.properties.interfacialTensionWater).toBeUndefined();
    expect(gallium.safety).toMatch(/aluminium/);
    // "about 3 %" in the safety note: CRC liquid density at the melting point over CRC solid density.
    expect(6080 / 5910 - 1).toBeGreaterThan(0.025);
    expect(6080 / 5910 - 1).toBeLessThan(0.035);
  });

  it('resolves at 30 °C with a caution only for the viscosity, whose correlation starts at 304 K', () => {
    const state = resolveFluid({ id: 'gallium', temperature: celsius(30) });
    expect(state.warnings.map((w) => w.message.split(' ')[0])).toEqual(['viscosity']);
    expect(resolveFluid({ id: 'gallium', temperature: celsius(40) }).warnings).toEqual([]);
  });
});

describe('catalogue names', () => {
  it('uses no supplier product-series or trade names in ids, names, descriptions, notes or citations', () => {
    const text = JSON.stringify(catalogueListing()).toLowerCase();
    for (const trade of [
      'krytox', 'fomblin', 'galinstan', 'dow corning', 'xiameter', 'pmx', 'syltherm', 'baysilone', 'wacker',
      'shin-etsu', 'dowtherm', 'therminol', 'novec', 'gpl-', '200 fluid', '200-series',
    ]) {
      expect(text).not.toContain(trade);
    }
  });
});

describe('light mineral oil', () => {
  // USP 32–NF 27, Topical Light Mineral Oil: specific gravity 0.818–0.880. Water at 25 °C, 997.05 kg/m³ (IAPWS SR6-08
  // through the catalogue), as the reference for the specific gravity; the range is wide enough that 20 or 25 °C water
  // makes no difference here.
  it('lists a density inside the pharmacopoeial specific-gravity range 0.818–0.880', () => {
    const water = getFluid('water')!.properties.density!.at(298.15);
    const oil = getFluid('mineral-oil-light')!.properties.density!.at(298.15);
    expect(oil / water).toBeGreaterThan(0.818);
    expect(oil / water).toBeLessThan(0.88);
    expect(getFluid('mineral-oil-light')!.description).toContain('usp32-light-mineral-oil');
  });
});

describe('fluorinated oils', () => {
  it('lists the CRC Handbook density of perfluorodecalin, 1930.5 kg/m³ (Physical Constants of Organic Compounds as transcribed in the chemicals library, which drops the temperature of the entry: 20 or 25 °C)', () => {
    const density = getFluid('perfluorodecalin')!.properties.density!;
    expect(density.at(298.15)).toBe(1930.525);
    expect(density.source.key).toBe('crc2014-organic-constants');
  });

  it('names carbonyl fluoride and Lewis-acid catalysis in the perfluoropolyether safety note (Pacansky & Waltman 1997, J. Fluorine Chem. 83, 41)', () => {
    const safety = getFluid('pfpe-generic')!.safety ?? '';
    expect(safety).toMatch(/carbonyl fluoride/);
    expect(safety).toMatch(/Lewis-acidic/);
    expect(safety).toMatch(/pacansky-waltman1997/);
  });
});
