/**
 * The response envelope every calculation returns, the stable hash of its
 * normalised inputs, and the guard that keeps NaN and Infinity out of
 * responses.
 */
import { hash } from 'node:crypto';
import type { ModelId } from '../core/models.js';
import type { Reference } from '../core/references.js';
import type { Warning } from '../core/notes.js';
import { catalogueNotes, type SafetyNote, type UserCatalogueProvenance } from './catalogue-notes.js';
import { concentrationNotes } from './schemas/concentration.js';

export const SERVICE_NAME = 'oilskin';
export const SERVICE_VERSION = '0.1.0';

/**
 * Canonical JSON: object keys sorted at every level (UTF-16 code-unit order), undefined members left out, no
 * whitespace. The inputs hash is a SHA-256 of this text, and clients keep that hash (ETag, LIMS records): the output
 * must never change for the same value. Written as one string-building walk, because it runs on every request (a
 * version with entries/filter/sort/map arrays cost about 3× as much, mostly in garbage collection); keys are sorted
 * with an explicit code-unit comparison (the default sort converts and compares through a slower generic path:
 * 14 → 7 µs for a /v1/flow echo) and their quoted forms are kept, the same few names coming back on every request
 * (7 → 4 µs).
 */
export function canonicalJson(value: unknown): string {
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : 'null';
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  if (Array.isArray(value)) {
    let text = '[';
    for (let i = 0; i < value.length; i++) text += (i === 0 ? '' : ',') + canonicalJson(value[i]);
    return `${text}]`;
  }
  const record = value as Record<string, unknown>;
  const keys = Object.keys(record).sort(byCodeUnit);
  let text = '{';
  let first = true;
  for (const key of keys) {
    const member = record[key];
    if (member === undefined) continue;
    const name = quotedKey(key);
    text += (first ? name : `,${name}`) + canonicalJson(member);
    first = false;
  }
  return `${text}}`;
}

/** UTF-16 code-unit order, the order of the default sort for strings. */
function byCodeUnit(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

const QUOTED_KEYS_LIMIT = 2_000;
const quotedKeys = new Map<string, string>();

/** `"key":` — kept for the schema's member names; a client's own keys beyond the bound are quoted each time. */
function quotedKey(key: string): string {
  let quoted = quotedKeys.get(key);
  if (quoted === undefined) {
    quoted = `${JSON.stringify(key)}:`;
    if (quotedKeys.size < QUOTED_KEYS_LIMIT) quotedKeys.set(key, quoted);
  }
  return quoted;
}

/** SHA-256 (hex) of the canonical JSON of the normalised inputs, so a LIMS can cache results. */
export function inputsHash(inputs: unknown): string {
  // One-shot hash (Node ≥ 20.12): half the cost of a Hash object for a short text.
  return hash('sha256', canonicalJson(inputs), 'hex');
}

/** True when every number in a value is finite: the fast check every response passes, no paths built. */
function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (value === null || typeof value !== 'object') return true;
  if (ArrayBuffer.isView(value)) {
    const view = value as unknown as ArrayLike<number>;
    for (let i = 0; i < view.length; i++) if (!Number.isFinite(view[i])) return false;
    return true;
  }
  // Members that are numbers or strings (most of them) are checked here, without a call.
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) if (!finiteMember(value[i])) return false;
    return true;
  }
  // Object.values walks own enumerable properties only, as JSON does (faster than for…in with a hasOwn test).
  const values = Object.values(value);
  for (let i = 0; i < values.length; i++) if (!finiteMember(values[i])) return false;
  return true;
}

function finiteMember(member: unknown): boolean {
  if (typeof member === 'number') return Number.isFinite(member);
  return member === null || typeof member !== 'object' || allFinite(member);
}

/** Path of the first non-finite number in a value, or null when every number is finite. */
export function findNonFinite(value: unknown, path = ''): string | null {
  if (allFinite(value)) return null;
  if (typeof value === 'number') return path || '(root)';
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
