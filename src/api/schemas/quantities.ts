/**
 * One schema per physical quantity: SI unit, bounds and description, reused by
 * every route. A JSON number is SI; a string carries its unit and is converted
 * (src/api/units.ts). Bounds exclude only the impossible and the absurd;
 * meaningful but unusual values pass and the physics warns.
 */
import { z } from './zod.js';
import { parseQuantity, UnitError } from '../units.js';

export interface QuantityDefinition {
  /** Physical quantity, e.g. "length". */
  quantity: string;
  /** SI unit as a mathjs expression ("m", "N/m", "Pa*s", "K", "deg"). */
  siUnit: string;
  /** Unit shown to people in the OpenAPI document. */
  unitLabel: string;
  min: number;
  minInclusive: boolean;
  max: number;
  description: string;
  example: number | string;
  /** Whether a unit string is accepted (false: JSON number only). */
  acceptsUnitString?: boolean;
  /** Added to the message for a unit of the wrong dimension (e.g. how to convert a common mistake). */
  hint?: string;
}

/** What a caller may send for a quantity, for the message of a rejected unit. */
function accepted(def: QuantityDefinition): string {
  return `give the ${def.quantity} as a number in ${def.unitLabel} or as a string with a unit convertible to ${def.unitLabel}, e.g. "${def.example}"${def.hint ? `; ${def.hint}` : ''}`;
}

function describe(def: QuantityDefinition): string {
  const lower = `${def.minInclusive ? '≥' : '>'} ${def.min}`;
  const strings = def.acceptsUnitString === false ? '' : ` A string with a unit (e.g. "${def.example}") is converted.`;
  return `${def.description} [${def.unitLabel}; ${lower}, ≤ ${def.max}].${strings}`;
}

/** Build the schema of one physical quantity; its parsed value is a finite SI number. */
export function quantity(def: QuantityDefinition) {
  const input = def.acceptsUnitString === false ? z.number() : z.union([z.number(), z.string()]);
  return input
    .transform((raw, ctx): number => {
      let value: number;
      if (typeof raw === 'number') {
        value = raw;
      } else {
        try {
          value = parseQuantity(raw, def.siUnit);
        } catch (error) {
          ctx.addIssue({ code: 'custom', message: `${error instanceof UnitError ? error.message : 'unreadable quantity'}; ${accepted(def)}` });
          return z.NEVER;
        }
      }
      if (!Number.isFinite(value)) {
        ctx.addIssue({ code: 'custom', message: `${def.quantity} must be a finite number` });
        return z.NEVER;
      }
      const belowMin = def.minInclusive ? value < def.min : value <= def.min;
      if (belowMin || value > def.max) {
        ctx.addIssue({
          code: 'custom',
          message: `${def.quantity} ${value} ${def.unitLabel} is outside ${def.minInclusive ? '[' : '('}${def.min}, ${def.max}]`,
        });
        return z.NEVER;
      }
      return value;
    })
    .openapi({ description: describe(def), example: def.example });
}

export const TextureLength = quantity({
  quantity: 'texture length',
  siUnit: 'm',
  unitLabel: 'm',
  min: 0,
  minInclusive: false,
  max: 0.05,
  description: 'A texture dimension',
  example: '50 um',
});

export const FlowLength = quantity({
  quantity: 'length',
  siUnit: 'm',
  unitLabel: 'm',
  // Below a nanometre there is no continuum flow (src/physics/continuum.ts); smaller values also underflow the correlations.
  min: 1e-9,
  minInclusive: true,
  max: 1000,
  description: 'A flow dimension (channel height, pipe diameter, distance)',
  example: '10 mm',
});

export const Roughness = quantity({
  quantity: 'roughness',
  siUnit: 'm',
  unitLabel: 'm',
  min: 0,
  minInclusive: true,
  max: 1,
  description: 'Equivalent sand-grain roughness ε of the pipe wall',
  example: '0.05 mm',
});

export const Velocity = quantity({
  quantity: 'velocity',
  siUnit: 'm/s',
  unitLabel: 'm/s',
  // A picometre per second is at rest for every question here; far smaller values underflow the friction velocity to 0.
  min: 1e-12,
  minInclusive: true,
  max: 200,
  description: 'A flow velocity',
  example: '1 m/s',
});

export const ShearStress = quantity({
  quantity: 'shear stress',
  siUnit: 'Pa',
  unitLabel: 'Pa',
  // As for velocities: a picopascal is a wall at rest; far smaller values underflow the friction velocity to 0.
  min: 1e-12,
  minInclusive: true,
  max: 1e5,
  description: 'A shear stress',
  example: '2 Pa',
});

export const Density = quantity({
  quantity: 'density',
  siUnit: 'kg/m^3',
  unitLabel: 'kg/m³',
  min: 0.01,
  minInclusive: true,
  max: 25000,
  description: 'Mass density',
  example: '998 kg/m^3',
});

export const DynamicViscosity = quantity({
  quantity: 'dynamic viscosity',
  siUnit: 'Pa*s',
  unitLabel: 'Pa·s',
  min: 0,
  minInclusive: false,
  max: 1e4,
  description: 'Dynamic viscosity',
  example: '1 mPa.s',
});

export const KinematicViscosity = quantity({
  quantity: 'kinematic viscosity',
  siUnit: 'm^2/s',
  unitLabel: 'm²/s',
  min: 0,
  minInclusive: false,
  max: 10,
  description: 'Kinematic viscosity (converted to dynamic viscosity with the density)',
  example: '10 cSt',
});

export const SurfaceTension = quantity({
  quantity: 'surface tension',
  siUnit: 'N/m',
  unitLabel: 'N/m',
  min: 0,
  minInclusive: false,
  max: 1,
  description: 'Surface or interfacial tension',
  example: '52 mN/m',
});

export const Temperature = quantity({
  quantity: 'temperature',
  siUnit: 'K',
  unitLabel: 'K',
  min: 0,
  minInclusive: false,
  max: 2000,
  description: 'Temperature; a number is kelvin',
  example: '20 degC',
});

export const ThermalConductivity = quantity({
  quantity: 'thermal conductivity',
  siUnit: 'W/(m*K)',
  unitLabel: 'W/(m·K)',
  min: 0,
  minInclusive: false,
  max: 5000,
  description: 'Thermal conductivity',
  example: '0.6 W/(m*K)',
});

export const SpecificHeat = quantity({
  quantity: 'specific heat capacity',
  siUnit: 'J/(kg*K)',
  unitLabel: 'J/(kg·K)',
  min: 0,
  minInclusive: false,
  max: 1e5,
  description: 'Specific heat capacity at constant pressure',
  example: '4180 J/(kg*K)',
});

export const ContactAngle = quantity({
  quantity: 'contact angle',
  siUnit: 'deg',
  unitLabel: 'degrees',
  min: 0,
  minInclusive: true,
  max: 180,
  description: 'Contact angle in degrees',
  example: 30,
});

export const FlowAngle = quantity({
  quantity: 'flow angle',
  siUnit: 'deg',
  unitLabel: 'degrees',
  min: 0,
  minInclusive: true,
  max: 90,
  description: 'Angle between the mean flow and the grooves in degrees (0 = flow along the grooves, 90 = across)',
  example: 0,
});

export const Inclination = quantity({
  quantity: 'inclination',
  siUnit: 'deg',
  unitLabel: 'degrees',
  min: -90,
  minInclusive: true,
  max: 90,
  description: 'Inclination of the wall from horizontal in degrees',
  example: 0,
});

export const Fraction = quantity({
  quantity: 'fraction',
  siUnit: '1',
  unitLabel: '1',
  min: 0,
  minInclusive: true,
  max: 1,
  description: 'A fraction between 0 and 1',
  example: 1,
  acceptsUnitString: false,
});

export const Duration = quantity({
  quantity: 'duration',
  siUnit: 's',
  unitLabel: 's',
  min: 0,
  minInclusive: false,
  max: 1e10,
  description: 'A duration',
  example: '2 h',
});

export const Concentration = quantity({
  quantity: 'concentration',
  siUnit: 'mol/m^3',
  unitLabel: 'mol/m³',
  min: 0,
  minInclusive: true,
  max: 1e4,
  description: 'Molar bulk concentration (1 mM = 1 mol/m³)',
  example: '0.1 mM',
});

export const MolarMass = quantity({
  quantity: 'molar mass',
  siUnit: 'kg/mol',
  unitLabel: 'kg/mol',
  min: 0,
  minInclusive: false,
  // A large protein is about 1000 kg/mol; nothing dissolved as a surfactant is heavier.
  max: 1000,
  description: 'Molar mass (converts a mass concentration to a molar one)',
  example: '288.38 g/mol',
});

export const MassConcentration = quantity({
  quantity: 'mass concentration',
  siUnit: 'kg/m^3',
  unitLabel: 'kg/m³',
  min: 0,
  minInclusive: true,
  max: 1000,
  description: 'Mass per volume (solubility, salinity)',
  example: '0.01 mg/L',
});

export const Salinity = quantity({
  quantity: 'absolute salinity',
  siUnit: '1',
  unitLabel: 'g/kg',
  min: 0,
  minInclusive: true,
  max: 120,
  description: 'Absolute salinity of seawater in g/kg',
  example: 35,
  acceptsUnitString: false,
});

export const WallInclination = quantity({
  quantity: 'inclination',
  siUnit: 'deg',
  unitLabel: 'degrees',
  min: 0,
  minInclusive: true,
  max: 90,
  description: 'Inclination of the wall from horizontal in degrees (0 = horizontal, 90 = vertical)',
  example: 30,
});

export const SurfaceExcess = quantity({
  quantity: 'surface excess',
  siUnit: 'mol/m^2',
  unitLabel: 'mol/m²',
  min: 0,
  minInclusive: false,
  max: 1e-3,
  description: 'Maximum surface excess Γ_m of a surfactant at the interface',
  example: '3.9 umol/m^2',
});

export const LangmuirConstant = quantity({
  quantity: 'Langmuir constant',
  siUnit: 'm^3/mol',
  unitLabel: 'm³/mol',
  min: 0,
  minInclusive: false,
  max: 1e12,
  description: 'Langmuir equilibrium constant K = κ_a/κ_d',
  example: '179 L/mol',
});

export const AdsorptionRate = quantity({
  quantity: 'adsorption rate constant',
  siUnit: 'm^3/(mol*s)',
  unitLabel: 'm³/(mol·s)',
  min: 0,
  minInclusive: false,
  max: 1e12,
  description: 'Adsorption rate constant κ_a',
  example: 89.5,
});

export const DesorptionRate = quantity({
  quantity: 'desorption rate constant',
  siUnit: '1/s',
  unitLabel: '1/s',
  min: 0,
  minInclusive: false,
  max: 1e12,
  description: 'Desorption rate constant κ_d',
  example: 500,
});

export const Diffusivity = quantity({
  quantity: 'diffusivity',
  siUnit: 'm^2/s',
  unitLabel: 'm²/s',
  min: 0,
  minInclusive: false,
  max: 1e-3,
  description: 'Molecular diffusivity',
  example: '7e-10 m^2/s',
});

export const GibbsPrefactor = quantity({
  quantity: 'Gibbs prefactor',
  siUnit: '1',
  unitLabel: '1',
  min: 1,
  minInclusive: true,
  max: 3,
  description: 'n in σ = σ0 + nRTΓ_m ln(1 − Γ/Γ_m): 1 nonionic, 2 ionic without added salt',
  example: 2,
  acceptsUnitString: false,
});
