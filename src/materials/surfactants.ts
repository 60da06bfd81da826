/**
 * Built-in surfactant catalogue. Adsorption constants belong to an interface
 * (air–water, oil–water), not to the surfactant alone, so each surfactant
 * carries one parameter set per interface type for which data exist; a value
 * without a source stays out rather than being guessed. Every value carries
 * its source reference; values recalled but not confirmed against the
 * source carry the recalled-value tag (records.ts) in their note, and the
 * resolver warns when it uses one.
 *
 * Units (SI): surface excess mol/m², Langmuir constant m³/mol, adsorption
 * rate constant m³/(mol·s), desorption rate constant 1/s, diffusivities
 * m²/s, concentrations mol/m³ (1 mol/m³ = 1 mM).
 */
import type { SurfactantParameters } from '../core/catalogue.js';
import type { InterfaceType, ResolvedSurfactant } from '../core/surfactant.js';
import { DomainError } from '../core/errors.js';
import type { Warning } from '../core/notes.js';
import { REFERENCES, type Reference } from '../core/references.js';
import { userSurfactant, userSurfactants, type CatalogueOrigin } from './user-catalogue.js';
import { RECALLED_TAG } from './records.js';
import { GAS_CONSTANT } from '../core/constants.js';
import { CHANG_FRANSES_1995, IUPAC_ATOMIC_WEIGHTS_1995, PROSSER_FRANSES_2001, ROSEN_KUNJAPPU_2012, SURFPRO_2025 } from './references.js';



/** One catalogue number with its witness. */
export interface SourcedValue {
  value: number;
  source: Reference;
  /** e.g. the recalled-value tag, "at 25 °C", "assumed equal to the bulk value by the source". */
  note?: string;
}

/** Adsorption parameters of one surfactant at one interface type. */
export interface InterfaceAdsorptionData {
  /** Γ_m, maximum surface excess, mol/m². */
  maximumSurfaceExcess?: SourcedValue;
  /** K = κ_a/κ_d, Langmuir equilibrium constant, m³/mol. */
  langmuirConstant?: SourcedValue;
  /** κ_a, adsorption rate constant, m³/(mol·s). */
  adsorptionRate?: SourcedValue;
  /** κ_d, desorption rate constant, 1/s. */
  desorptionRate?: SourcedValue;
  /** D_I, surface diffusivity, m²/s. */
  surfaceDiffusivity?: SourcedValue;
  /** n, Gibbs prefactor (1 for nonionic, 2 for a 1:1 ionic surfactant without added salt). */
  gibbsPrefactor?: SourcedValue;
}

export interface CatalogueSurfactant {
  id: string;
  name: string;
  kind: 'anionic' | 'cationic' | 'nonionic';
  description: string;
  /** Bulk (monomer) diffusivity D, m²/s. */
  bulkDiffusivity?: SourcedValue;
  /** Critical micelle concentration in water at 25 °C, mol/m³. */
  criticalMicelleConcentration?: SourcedValue;
  /** Molar mass, kg/mol: converts mass concentrations ("1 mg/L", "1 ppm") to molar ones. */
  molarMass?: SourcedValue;
  /** Handling and safety notes (irritation, data sheet advice), repeated in the responses that use the entry. */
  safety?: string;
  interfaces: Partial<Record<InterfaceType, InterfaceAdsorptionData>>;
}

/** The sources the surfactant entries cite. */
const R = {
  chang1995: CHANG_FRANSES_1995,
  prosser2001: PROSSER_FRANSES_2001,
  landel2020: REFERENCES.landel2020,
  wilkeChang1955: REFERENCES.wilkeChang1955,
  surfpro2025: SURFPRO_2025,
  rosen2012: ROSEN_KUNJAPPU_2012,
  atomicWeights: IUPAC_ATOMIC_WEIGHTS_1995,
};

/*
 * Critical micelle concentrations, maximum surface excesses and surface pressures at the CMC are read in the
 * SurfPro data file (surfpro-2025), at 25 °C, with the publications its row names. The octylphenol ethoxylate's
 * measured diffusivity, CMC, Γ_m and K (recalled before; the diffusivity is now a Wilke–Chang estimate) were
 * searched for without a readable table: the study the set is usually traced to (Lin, McKeigue & Maldarelli 1990, AIChE J.:
 * not found), Chatterjee et al. (2001, J. Surface Sci. Technol. 17, 1: abstract only) and abstracts of
 * conductivity and fluorescence studies. docs/citations-ledger.md has the log.
 */

/**
 * The two p-tert-octylphenol ethoxylate homologues of SurfPro (surfpro-2025) that bracket the mean chain of the
 * catalogue entry, 9 and 10 ethylene-oxide units, at 25 °C: pCMC = −log₁₀(CMC/(mol/L)) from Katritzky et al.
 * (2007, J. Chem. Inf. Model. 47, 782; doi 10.1021/ci600462d) after Huibers et al. (1996, Langmuir 12, 1462;
 * doi 10.1021/la950581j); Γ_max and the surface pressure at the CMC, Π_cmc, from Rosen & Kunjappu (2012),
 * chapter doi 10.1002/9781118228920.ch5.
 */
export const OCTYLPHENOL_ETHOXYLATE_HOMOLOGUES = [
  { ethyleneOxideUnits: 9, pCmc: 3.523, maximumSurfaceExcess: 2.5e-6, surfacePressureAtCmc: 38.5e-3 },
  { ethyleneOxideUnits: 10, pCmc: 3.481, maximumSurfaceExcess: 2.2e-6, surfacePressureAtCmc: 37e-3 },
] as const;

const mean = (f: (h: (typeof OCTYLPHENOL_ETHOXYLATE_HOMOLOGUES)[number]) => number): number =>
  OCTYLPHENOL_ETHOXYLATE_HOMOLOGUES.reduce((sum, h) => sum + f(h), 0) / OCTYLPHENOL_ETHOXYLATE_HOMOLOGUES.length;

/** Mean of the homologues' CMCs, mol/m³ (1 mol/L = 1000 mol/m³): 0.29992 and 0.33037 give 0.31514. */
const OPE_CMC = mean((h) => 1000 * 10 ** -h.pCmc);
/** Mean Γ_max, mol/m²: 2.35e-6. */
const OPE_MAXIMUM_SURFACE_EXCESS = mean((h) => h.maximumSurfaceExcess);
/** Mean Π_cmc, N/m: 37.75 mN/m. */
const OPE_PRESSURE_AT_CMC = mean((h) => h.surfacePressureAtCmc);
/**
 * Langmuir constant K, m³/mol, our derivation: the Langmuir–Szyszkowski equation of state with n = 1,
 * Π = R T Γ_m ln(1 + K c), made to pass through the tabulated surface pressure at the CMC,
 * K = (exp(Π_cmc/(R T Γ_m)) − 1)/CMC at 298.15 K: 2.07e3 m³/mol (the homologues alone give 1.66e3 and 2.67e3).
 */
const OPE_LANGMUIR_CONSTANT = Math.expm1(OPE_PRESSURE_AT_CMC / (GAS_CONSTANT * 298.15 * OPE_MAXIMUM_SURFACE_EXCESS)) / OPE_CMC;

/**
 * Bulk (monomer) diffusivity, m²/s, estimated (ours) by the Wilke–Chang (1955) correlation
 * D = 7.4×10⁻⁸ (φ M_w)^½ T/(μ_w V_b^0.6) cm²/s with φ = 2.6, M_w = 18.015 g/mol, T = 298.15 K and
 * μ_w = 0.8900 mPa·s (the catalogue's water at 25 °C, IAPWS R12-08), and the Le Bas molar volume of the mean
 * molecule C₈H₁₇C₆H₄O(C₂H₄O)₉.₅H = C₃₃H₆₀O₁₀.₅ from the atomic increments of a textbook table read in a public
 * copy ("Table 24.5, Atomic volume increments for estimation of molecular volumes at the normal boiling point",
 * Scribd document 373545244, the book not named there): C 14.8, H 3.7, oxygen in higher ethers 11.0 (the aryl
 * ether and 8.5 ethylene-oxide oxygens: 9.5), benzene ring −15; the terminal hydroxyl oxygen takes the table's
 * "oxygen, except as noted" entry, whose digits are garbled in the copy's text layer ("14"; 7.4 in the usual
 * form of the table): 7.4 is used, and 14 would lower D by 0.5 %. V_b = 807.3 cm³/mol, D = 3.06e-10 m²/s.
 */
const OPE_LE_BAS_VOLUME = 33 * 14.8 + 60 * 3.7 + 9.5 * 11.0 + 7.4 - 15;
const OPE_BULK_DIFFUSIVITY = (1e-4 * 7.4e-8 * Math.sqrt(2.6 * 18.015) * 298.15) / (0.89 * OPE_LE_BAS_VOLUME ** 0.6);

const OPE_HOMOLOGUES_NOTE =
  'mean of the pure homologues with 9 and 10 ethylene-oxide units at 25 °C as tabulated in SurfPro; a ' +
  'polydisperse commercial product can differ from the pure homologues (measure it where it matters)';
export const SURFACTANTS: readonly CatalogueSurfactant[] = [
  {
    id: 'sds',
    name: 'sodium dodecyl sulfate',
    kind: 'anionic',
    description:
      'Anionic surfactant (SDS, C12H25SO4Na), the usual model contaminant in slip experiments. Air–water constants of the Langmuir–Szyszkowski fit without added salt.',
    bulkDiffusivity: {
      value: 7e-10,
      source: R.chang1995,
      note: 'value used by Landel et al. (2020) citing Chang & Franses (1995); not re-read in the review itself',
    },
    criticalMicelleConcentration: {
      value: 8.1,
      source: R.surfpro2025,
      note:
        'CMC 0.0081 mol/L at 25 °C without added salt, the SurfPro row, which names Lin & Marszall (1976, J. Colloid ' +
        'Interface Sci. 57, 85; doi 10.1016/0021-9797(76)90178-8), Qin et al. (2021, J. Phys. Chem. B 125, 10610; ' +
        'doi 10.1021/acs.jpcb.1c05264) and Katritzky et al. (2007; doi 10.1021/ci600462d) as its sources',
    },
    molarMass: { value: 0.28838, source: R.atomicWeights, note: 'C12H25NaO4S: 288.38 g/mol' },
    interfaces: {
      'air-water': {
        maximumSurfaceExcess: { value: 3.9e-6, source: R.chang1995, note: 'as used by Landel et al. (2020) from Chang & Franses (1995)' },
        langmuirConstant: {
          value: 0.179,
          source: R.chang1995,
          note: '179 L/mol = κ_a/κ_d with κ_a = 89.5 m³/(mol·s), κ_d = 500 1/s as used by Landel et al. (2020)',
        },
        adsorptionRate: { value: 89.5, source: R.chang1995, note: 'as used by Landel et al. (2020)' },
        desorptionRate: { value: 500, source: R.chang1995, note: 'as used by Landel et al. (2020)' },
        surfaceDiffusivity: {
          value: 7e-10,
          source: R.landel2020,
          note: 'not measured: taken equal to the bulk diffusivity by Landel et al. (2020)',
        },
        gibbsPrefactor: {
          value: 2,
          source: R.prosser2001,
          note: 'n = 2 for a 1:1 ionic surfactant without added electrolyte',
        },
      },
    },
  },
  {
    id: 'octylphenol-ethoxylate',
    name: 'octylphenol ethoxylate (about 9.5 ethylene-oxide units)',
    kind: 'nonionic',
    description:
      'Nonionic surfactant, polydisperse p-tert-octylphenol ethoxylate (p-tert-octylphenoxypolyoxyethylene ether) with about 9.5 ethylene-oxide units. Formerly catalogued under a product name ("triton-x-100"), which still resolves to this entry with a note. Its CMC, Γ_m and Langmuir constant are those of the pure homologues with 9 and 10 ethylene-oxide units, averaged (surfpro-2025). Kinetic rate constants are not catalogued (no confirmed source); calculations then assume diffusion-controlled exchange.',
    bulkDiffusivity: {
      value: OPE_BULK_DIFFUSIVITY,
      source: R.wilkeChang1955,
      note:
        'estimated by the Wilke–Chang correlation with the Le Bas volume 807.3 cm³/mol of the mean molecule at 25 °C ' +
        '(no measured value could be read; a recalled 2.6e-10 m²/s was replaced)',
    },
    criticalMicelleConcentration: {
      value: OPE_CMC,
      source: R.surfpro2025,
      note: `${OPE_HOMOLOGUES_NOTE}: pCMC 3.523 and 3.481 (Katritzky et al. 2007 after Huibers et al. 1996)`,
    },
    molarMass: {
      value: 0.62482,
      source: R.atomicWeights,
      note: 'mean of the polydisperse ethoxylate, C14H22O(C2H4O)n with the n = 9.5 the description states: 624.82 g/mol',
    },
    interfaces: {
      'air-water': {
        maximumSurfaceExcess: {
          value: OPE_MAXIMUM_SURFACE_EXCESS,
          source: R.surfpro2025,
          note: `${OPE_HOMOLOGUES_NOTE}: Γ_max 2.5e-6 and 2.2e-6 mol/m² (Rosen & Kunjappu 2012)`,
        },
        langmuirConstant: {
          value: OPE_LANGMUIR_CONSTANT,
          source: R.surfpro2025,
          note:
            'derived (ours): the Langmuir–Szyszkowski equation with the Γ_max above made to pass through the mean ' +
            'surface pressure at the CMC of the same homologues, 38.5 and 37 mN/m (Rosen & Kunjappu 2012)',
        },
        gibbsPrefactor: { value: 1, source: R.rosen2012, note: 'n = 1 for a nonionic surfactant (Gibbs equation)' },
      },
    },
  },
];

/** The catalogue surfactant with this id (built-in, else the user catalogue's), or undefined. */
export function getSurfactant(id: string): CatalogueSurfactant | undefined {
  return SURFACTANTS.find((s) => s.id === id) ?? userSurfactant(id) ?? formerBuiltIn(id);
}

/**
 * Ids the built-in catalogue used before, mapped to the entry's current id: a product name gave way to a generic
 * chemical name, and requests written against the former id keep working (with a note saying so).
 */
export const FORMER_SURFACTANT_IDS: Readonly<Record<string, string>> = { 'triton-x-100': 'octylphenol-ethoxylate' };

/** The built-in entry a former id stands for (a user entry of that id, if any, wins: it is looked up first). */
function formerBuiltIn(id: string): CatalogueSurfactant | undefined {
  const current = Object.hasOwn(FORMER_SURFACTANT_IDS, id) ? FORMER_SURFACTANT_IDS[id] : undefined;
  return current === undefined ? undefined : SURFACTANTS.find((s) => s.id === current);
}

/** Whether an id is a built-in surfactant or one of the user catalogue's; undefined when it is neither. */
export function surfactantOrigin(id: string): CatalogueOrigin | undefined {
  if (SURFACTANTS.some((s) => s.id === id)) return 'built-in';
  if (userSurfactant(id) !== undefined) return 'user';
  return formerBuiltIn(id) === undefined ? undefined : 'built-in';
}

const VALUE_UNITS = {
  maximumSurfaceExcess: 'mol/m^2',
  langmuirConstant: 'm^3/mol',
  adsorptionRate: 'm^3/(mol*s)',
  desorptionRate: '1/s',
  surfaceDiffusivity: 'm^2/s',
  gibbsPrefactor: '1',
  bulkDiffusivity: 'm^2/s',
  criticalMicelleConcentration: 'mol/m^3',
  molarMass: 'kg/mol',
} as const;

interface ListedValue {
  value: number;
  unit: string;
  source: string;
  note?: string;
}

function listValue(name: keyof typeof VALUE_UNITS, v: SourcedValue | undefined): ListedValue | undefined {
  if (!v) return undefined;
  return { value: v.value, unit: VALUE_UNITS[name], source: v.source.key, ...(v.note ? { note: v.note } : {}) };
}

/** JSON-ready catalogue for GET /v1/surfactants: values with units and source keys, plus the reference list. */
export function surfactantListing(): {
  surfactants: Array<Record<string, unknown>>;
  references: Reference[];
} {
  const refs = new Map<string, Reference>();
  const surfactants = [...SURFACTANTS, ...userSurfactants()].map((s) => {
    const collect = (v: SourcedValue | undefined): void => {
      if (v) refs.set(v.source.key, v.source);
    };
    collect(s.bulkDiffusivity);
    collect(s.criticalMicelleConcentration);
    collect(s.molarMass);
    const interfaces: Record<string, Record<string, ListedValue>> = {};
    for (const [type, data] of Object.entries(s.interfaces) as [InterfaceType, InterfaceAdsorptionData][]) {
      const entry: Record<string, ListedValue> = {};
      for (const key of Object.keys(data) as (keyof InterfaceAdsorptionData)[]) {
        collect(data[key]);
        const listed = listValue(key, data[key]);
        if (listed) entry[key] = listed;
      }
      interfaces[type] = entry;
    }
    const out: Record<string, unknown> = { id: s.id, name: s.name, kind: s.kind, description: s.description };
    const bulk = listValue('bulkDiffusivity', s.bulkDiffusivity);
    if (bulk) out.bulkDiffusivity = bulk;
    const cmc = listValue('criticalMicelleConcentration', s.criticalMicelleConcentration);
    if (cmc) out.criticalMicelleConcentration = cmc;
    const molarMass = listValue('molarMass', s.molarMass);
    if (molarMass) out.molarMass = molarMass;
    out.safety = s.safety ?? null;
    out.origin = surfactantOrigin(s.id);
    out.interfaces = interfaces;
    return out;
  });
  return { surfactants, references: [...refs.values()] };
}

/** What the catalogue resolver takes: an id and/or parameters, for one interface type. */
export interface SurfactantResolveSpec {
  /** Catalogue id; omit to give every parameter explicitly. */
  id?: string;
  interfaceType: InterfaceType;
  parameters?: SurfactantParameters;
  /** Display name of a custom surfactant. */
  name?: string;
}

/**
 * Resolve catalogue values plus request overrides for one interface. K is
 * derived as κ_a/κ_d when both rate constants are known and K is not given;
 * a given K that disagrees with κ_a/κ_d by more than 1 % is a warning, and
 * κ_d is then re-derived as κ_a/K so the kinetics match the isotherm.
 * Missing required values (Γ_m, K, D, n) throw DomainError; a missing
 * surface diffusivity falls back to the bulk diffusivity (assumption, warned).
 */
export function resolveSurfactant(spec: SurfactantResolveSpec, field = 'surfactant'): ResolvedSurfactant {
  const entry = spec.id !== undefined ? getSurfactant(spec.id) : undefined;
  if (spec.id !== undefined && !entry) {
    throw new DomainError(`unknown surfactant "${spec.id}"`, { field: `${field}.id`, code: 'unknown-surfactant' });
  }
  const data = entry?.interfaces[spec.interfaceType];
  const p = spec.parameters ?? {};
  const origins: Record<string, string> = {};
  const refs = new Map<string, Reference>();
  const warnings: Warning[] = [];
  if (entry !== undefined && spec.id !== undefined && entry.id !== spec.id) {
    warnings.push({
      code: 'former-catalogue-id',
      severity: 'info',
      message: `"${spec.id}" is the former id of the catalogue surfactant "${entry.id}" (${entry.name}); use the new id`,
    });
  }
  const pick = (name: keyof SurfactantParameters, catalogue: SourcedValue | undefined): number | undefined => {
    const given = p[name];
    if (given !== undefined) {
      if (!Number.isFinite(given) || given <= 0) {
        throw new DomainError(`${name} must be a positive finite number`, { field: `${field}.${name}` });
      }
      origins[name] = 'input';
      return given;
    }
    if (catalogue) {
      origins[name] = catalogue.source.key;
      refs.set(catalogue.source.key, catalogue.source);
      if (catalogue.note?.includes(RECALLED_TAG)) {
        warnings.push({
          code: 'surfactant-value-from-memory',
          severity: 'caution',
          message: `${name} of ${entry?.name ?? 'the surfactant'} is recalled, not confirmed against its source`,
        });
      }
      return catalogue.value;
    }
    return undefined;
  };
  if (entry && !data && Object.keys(p).length === 0) {
    throw new DomainError(`no ${spec.interfaceType} adsorption data for ${entry.name}; give the parameters explicitly`, {
      field,
      code: 'missing-interface-data',
    });
  }
  const maximumSurfaceExcess = pick('maximumSurfaceExcess', data?.maximumSurfaceExcess);
  const adsorptionRate = pick('adsorptionRate', data?.adsorptionRate);
  let desorptionRate = pick('desorptionRate', data?.desorptionRate);
  let langmuirConstant = pick('langmuirConstant', data?.langmuirConstant);
  if (langmuirConstant === undefined && adsorptionRate !== undefined && desorptionRate !== undefined) {
    langmuirConstant = adsorptionRate / desorptionRate;
    origins.langmuirConstant = 'derived';
  }
  const bulkDiffusivity = pick('bulkDiffusivity', entry?.bulkDiffusivity);
  let surfaceDiffusivity = pick('surfaceDiffusivity', data?.surfaceDiffusivity);
  const gibbsPrefactor = pick('gibbsPrefactor', data?.gibbsPrefactor);
  const criticalMicelleConcentration = pick('criticalMicelleConcentration', entry?.criticalMicelleConcentration);
  const required: [string, number | undefined][] = [
    ['maximumSurfaceExcess', maximumSurfaceExcess],
    ['langmuirConstant', langmuirConstant],
    ['bulkDiffusivity', bulkDiffusivity],
    ['gibbsPrefactor', gibbsPrefactor],
  ];
  for (const [name, value] of required) {
    if (value === undefined) {
      throw new DomainError(`${name} is not known for this surfactant and interface; give it explicitly`, {
        field: `${field}.${name}`,
        code: 'missing-surfactant-parameter',
      });
    }
  }
  if (surfaceDiffusivity === undefined) {
    surfaceDiffusivity = bulkDiffusivity as number;
    origins.surfaceDiffusivity = 'derived';
    warnings.push({
      code: 'surface-diffusivity-assumed',
      severity: 'info',
      message: 'surface diffusivity unknown: taken equal to the bulk diffusivity',
    });
  }
  if ((adsorptionRate === undefined) !== (desorptionRate === undefined)) {
    if (adsorptionRate !== undefined && langmuirConstant !== undefined) {
      desorptionRate = adsorptionRate / langmuirConstant;
      origins.desorptionRate = 'derived';
    } else {
      warnings.push({
        code: 'kinetics-incomplete',
        severity: 'caution',
        message: 'only one kinetic rate constant known: exchange treated as diffusion-controlled',
      });
      desorptionRate = undefined;
    }
  }
  const K = langmuirConstant as number;
  if (adsorptionRate !== undefined && desorptionRate !== undefined) {
    const ratio = adsorptionRate / desorptionRate;
    if (Math.abs(ratio / K - 1) > 0.01) {
      warnings.push({
        code: 'kinetics-isotherm-mismatch',
        severity: 'warning',
        message: `κ_a/κ_d = ${ratio.toPrecision(4)} m³/mol differs from K = ${K.toPrecision(4)} m³/mol: κ_d re-derived as κ_a/K`,
      });
      desorptionRate = adsorptionRate / K;
      origins.desorptionRate = 'derived';
    }
  }
  return {
    id: entry?.id ?? 'custom',
    name: spec.name ?? entry?.name ?? 'custom surfactant',
    interfaceType: spec.interfaceType,
    maximumSurfaceExcess: maximumSurfaceExcess as number,
    langmuirConstant: K,
    ...(adsorptionRate !== undefined && desorptionRate !== undefined ? { adsorptionRate, desorptionRate } : {}),
    bulkDiffusivity: bulkDiffusivity as number,
    surfaceDiffusivity,
    gibbsPrefactor: gibbsPrefactor as number,
    ...(criticalMicelleConcentration !== undefined ? { criticalMicelleConcentration } : {}),
    origins,
    references: [...refs.values()],
    warnings,
  };
}
