/**
 * Output columns of a sweep: paths into the single-point response of the
 * calculation (`result.wallShearStress`, `verdict.margin`,
 * `inputs.workingFluid.density.value`) or `warnings` (the codes of the point's
 * warnings), each with its SI unit where the response schema states one.
 * Defaults per calculation: a short list for the calculations we know, else
 * every scalar of the result and the verdict, so a calculation added to the
 * registry sweeps without an entry here.
 */
import { getOpenApiMetadata } from '@asteasolutions/zod-to-openapi';
import type { ZodType } from 'zod';
import { parseQuantity, UnitError } from '../units.js';
import type { CalculationDefinition } from '../calculation.js';
import { validationProblem } from '../problem.js';
import { isScalarSchema, keysOf, schemaAt } from './paths.js';

export interface Column {
  /** Header name: the path (`result.wallShearStress`), or `warnings`. */
  name: string;
  /** SI unit where known ("m", "Pa", "m/s"), null for dimensionless or unknown. */
  unit: string | null;
  /** Where the value comes from: the axis value set at the point, an output path, or the warning codes. */
  source: { kind: 'axis'; axis: number } | { kind: 'output'; path: string[] } | { kind: 'warnings' };
}

/** The column of the warning codes (joined by ";"). */
export const WARNINGS_COLUMN = 'warnings';

/** Default outputs of the calculations we know (main results first); others use every scalar of result and verdict. */
const DEFAULT_OUTPUTS: Record<string, readonly string[]> = {
  flow: ['result.wallShearStress', 'result.frictionVelocity', 'result.viscousLength', 'result.reynoldsNumber', 'result.regime'],
  wetting: ['result.state', 'result.criticalAngle', 'result.energyMargin', 'verdict.passes', 'verdict.margin'],
  retention: ['result.bindingMechanism', 'result.retainedLength', 'result.criticalPlugLength', 'result.retainedFraction', 'verdict.passes', 'verdict.margin'],
  slip: ['result.slipLengthLongitudinal', 'result.slipLengthTransverse', 'result.slipLengthAlongFlow', 'result.drag.dragReduction', 'result.method'],
  waves: ['result.regime', 'result.governingCriterion', 'verdict.passes', 'verdict.margin'],
  surfactant: ['result.cleanSlipLength', 'result.slipLength', 'result.slipRetained', 'result.regime', 'result.drag.dragReduction'],
  assess: [
    'result.overall.verdict',
    'result.overall.limitingMechanism',
    'result.couplings.creditedDragReductionAtServiceTime',
    'result.couplings.filledFractionAtServiceTime',
    'result.couplings.waveRegime',
    ...['wetting', 'retention', 'waves', 'slipAndDrag', 'surfactant', 'heat'].map((m) => `result.mechanisms.${m}.verdict.margin`),
  ],
  heat: ['result.heatFluxRatio', 'result.nusseltRatio', 'result.thermalSlipLength', 'result.frictionRatio', 'result.method'],
};

/** The part of a description after its last comma when that part is a unit ("τ_w on a smooth wall, Pa" → "Pa"). */
export function unitFromDescription(description: string | undefined): string | null {
  if (!description) return null;
  // A trailing remark in parentheses is not part of the unit: "…, m (as /v1/slip)".
  const text = description.replace(/\s+\([^()]*\)\s*$/, '');
  const tail = text.slice(text.lastIndexOf(',') + 1).trim();
  if (tail === '' || /\s/.test(tail) || tail.length > 16) return null;
  try {
    parseQuantity(`1 ${tail}`, 'm');
    return tail;
  } catch (error) {
    // Read as a quantity of another dimension: it is a unit.
    return error instanceof UnitError && /wrong dimension/.test(error.message) ? tail : null;
  }
}

function describedUnit(schema: ZodType): string | null {
  const description = (getOpenApiMetadata(schema) as { description?: string } | undefined)?.description;
  return unitFromDescription(description);
}

/** Every scalar field directly under `prefix` of the response schema. */
function scalarFields(response: ZodType, prefix: string): string[] {
  const at = schemaAt(response, [prefix]);
  if (!('schema' in at)) return [];
  return keysOf(at.schema)
    .filter((key) => {
      const field = schemaAt(at.schema, [key]);
      return 'schema' in field && isScalarSchema(field.schema);
    })
    .map((key) => `${prefix}.${key}`);
}

/** The default output paths of a calculation. */
export function defaultOutputs(definition: CalculationDefinition): string[] {
  const known = DEFAULT_OUTPUTS[definition.name];
  if (known) return [...known];
  const verdict = schemaAt(definition.response, ['verdict']);
  return [...scalarFields(definition.response, 'result'), ...('schema' in verdict ? ['verdict.passes', 'verdict.margin'] : [])];
}

/** Resolve the output columns asked for (or the defaults), 422 naming `columns[i]` for a path the response does not have. */
export function outputColumns(definition: CalculationDefinition, asked: readonly string[] | undefined): Column[] {
  const paths = asked ?? [...defaultOutputs(definition), WARNINGS_COLUMN];
  const errors: { path: string; message: string }[] = [];
  const columns: Column[] = [];
  paths.forEach((name, i) => {
    if (name === WARNINGS_COLUMN) {
      columns.push({ name, unit: null, source: { kind: 'warnings' } });
      return;
    }
    const path = name.split('.');
    const at = schemaAt(definition.response, path);
    if (!('schema' in at)) {
      const where = path.slice(0, at.missingAt).join('.') || 'the response';
      errors.push({ path: `columns[${i}]`, message: `${definition.name} has no ${path[at.missingAt]} under ${where}; it has: ${at.allowed.join(', ')}` });
    } else if (!isScalarSchema(at.schema)) {
      errors.push({ path: `columns[${i}]`, message: `${name} is not a single value; name one of its fields: ${keysOf(at.schema).join(', ') || '(none)'}` });
    } else {
      columns.push({ name, unit: describedUnit(at.schema), source: { kind: 'output', path } });
    }
  });
  if (errors.length > 0) throw validationProblem(errors);
  return columns;
}
