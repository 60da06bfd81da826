/**
 * The response envelope every calculation returns, the stable hash of its
 * normalised inputs, and the guard that keeps NaN and Infinity out of
 * responses.
 */
import { createHash } from 'node:crypto';
import type { ModelId } from '../core/models.js';
import type { Reference } from '../core/references.js';
import type { Warning } from '../core/notes.js';
import { catalogueNotes, type SafetyNote, type UserCatalogueProvenance } from './catalogue-notes.js';
import { concentrationNotes } from './schemas/concentration.js';

export const SERVICE_NAME = 'oilskin';
export const SERVICE_VERSION = '0.1.0';

/** Canonical JSON: object keys sorted at every level, no whitespace. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

/** SHA-256 (hex) of the canonical JSON of the normalised inputs, so a LIMS can cache results. */
export function inputsHash(inputs: unknown): string {
  return createHash('sha256').update(canonicalJson(inputs)).digest('hex');
}

/** Path of the first non-finite number in a value, or null when every number is finite. */
export function findNonFinite(value: unknown, path = ''): string | null {
  if (typeof value === 'number') return Number.isFinite(value) ? null : path || '(root)';
  if (value === null || typeof value !== 'object') return null;
  if (ArrayBuffer.isView(value)) {
    const view = value as unknown as ArrayLike<number>;
    for (let i = 0; i < view.length; i++) if (!Number.isFinite(view[i])) return `${path}[${i}]`;
    return null;
  }
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const p = findNonFinite(value[i], `${path}[${i}]`);
      if (p) return p;
    }
    return null;
  }
  for (const [k, v] of Object.entries(value as Record<string, unknown>)) {
    const p = findNonFinite(v, path ? `${path}.${k}` : k);
    if (p) return p;
  }
  return null;
}

/**
 * JSON serialisation used for every reply: typed arrays become arrays and any
 * non-finite number that slipped past the calculation guard becomes null, so
 * the wire never carries NaN or Infinity (JSON cannot express them).
 */
export function safeStringify(payload: unknown): string {
  return JSON.stringify(payload, (_key, v: unknown) => {
    if (typeof v === 'number' && !Number.isFinite(v)) return null;
    if (ArrayBuffer.isView(v)) return Array.from(v as unknown as ArrayLike<number>);
    return v;
  });
}

export interface CalculationOutput {
  /** Normalised SI inputs, echoed. */
  inputs: unknown;
  result: unknown;
  verdict?: unknown;
  warnings: readonly Warning[];
  assumptions: readonly string[];
  references: readonly Reference[];
  models: readonly ModelId[];
}

export interface Envelope extends Omit<CalculationOutput, 'models'> {
  /** Safety notes of the catalogue fluids and surfactants the calculation used, one per entry. */
  safety: SafetyNote[];
  provenance: {
    service: string;
    version: string;
    models: readonly ModelId[];
    inputsHash: string;
    computeMs: number;
    /** Present when a user catalogue entry was used. */
    userCatalogue?: UserCatalogueProvenance;
  };
}

/**
 * The response around a calculation's output. `document` is the parsed
 * request: the unit conversions made while parsing it join the assumptions
 * when the question used that part.
 */
export function envelope(output: CalculationOutput, computeMs: number, document?: object): Envelope {
  const { models, ...rest } = output;
  const catalogue = catalogueNotes(rest.inputs);
  const usedWaterQuality = typeof rest.inputs === 'object' && rest.inputs !== null && 'waterQuality' in rest.inputs;
  const conversions = document !== undefined && usedWaterQuality ? concentrationNotes(document) : [];
  return {
    inputs: rest.inputs,
    result: rest.result,
    ...(rest.verdict === undefined ? {} : { verdict: rest.verdict }),
    warnings: catalogue.warnings.length === 0 ? rest.warnings : [...rest.warnings, ...catalogue.warnings],
    assumptions: conversions.length === 0 ? rest.assumptions : [...rest.assumptions, ...conversions],
    references: rest.references,
    safety: catalogue.safety,
    provenance: {
      service: SERVICE_NAME,
      version: SERVICE_VERSION,
      models,
      inputsHash: inputsHash(rest.inputs),
      computeMs: Math.round(computeMs * 1000) / 1000,
      ...(catalogue.userCatalogue === undefined ? {} : { userCatalogue: catalogue.userCatalogue }),
    },
  };
}
