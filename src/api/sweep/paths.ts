/**
 * Walking zod schemas by dot paths: which schema a path of the design document
 * (a sweep axis) or of a response (an output column) leads to. Optional,
 * nullable and default wrappers are seen through; a union (the flow kinds)
 * leads on through whichever of its options has the key.
 */
import type { ZodType } from 'zod';

interface Def {
  type: string;
  checks?: unknown[];
  discriminator?: string;
  innerType?: ZodType;
  shape?: Record<string, ZodType>;
  options?: ZodType[];
  in?: ZodType;
  out?: ZodType;
  element?: ZodType;
}

function defOf(schema: ZodType): Def {
  return (schema as unknown as { _zod: { def: Def } })._zod.def;
}

/**
 * The schema without optional/nullable/default wrappers, and without a transform applied after parsing
 * (a pipe into a transform, e.g. the design document's concentration conversion): paths are paths of the input.
 */
export function unwrapSchema(schema: ZodType): ZodType {
  let s = schema;
  for (;;) {
    const def = defOf(s);
    if (['optional', 'nullable', 'default', 'readonly'].includes(def.type) && def.innerType) s = def.innerType;
    else if (def.type === 'pipe' && def.in && def.out && defOf(def.out).type === 'transform') s = def.in;
    else return s;
  }
}

/** Keys an object schema (or any option of a union of objects) accepts. */
export function keysOf(schema: ZodType): string[] {
  const def = defOf(unwrapSchema(schema));
  if (def.type === 'object' && def.shape) return Object.keys(def.shape);
  if (def.type === 'union' && def.options) return [...new Set(def.options.flatMap(keysOf))];
  return [];
}

/** The schema of `key` inside `schema`, or undefined when it has no such key. */
export function childSchema(schema: ZodType, key: string): ZodType | undefined {
  const def = defOf(unwrapSchema(schema));
  if (def.type === 'object' && def.shape) return Object.hasOwn(def.shape, key) ? def.shape[key] : undefined;
  if (def.type === 'union' && def.options) {
    for (const option of def.options) {
      const child = childSchema(option, key);
      if (child) return child;
    }
  }
  return undefined;
}

/** The schema at a path, or where the path leaves the schema (the index of the unknown key and what was allowed). */
export function schemaAt(schema: ZodType, path: readonly string[]): { schema: ZodType } | { missingAt: number; allowed: string[] } {
  let s = schema;
  for (let i = 0; i < path.length; i++) {
    const child = childSchema(s, path[i]!);
    if (!child) return { missingAt: i, allowed: keysOf(s) };
    s = child;
  }
  return { schema: s };
}

/** Whether values of this schema are scalars (number, string, boolean, enum, literal, or a union of those). */
export function isScalarSchema(schema: ZodType): boolean {
  const def = defOf(unwrapSchema(schema));
  if (['number', 'string', 'boolean', 'enum', 'literal', 'int', 'null'].includes(def.type)) return true;
  if (def.type === 'union' && def.options) return def.options.every(isScalarSchema);
  // A quantity: a number or a unit string in, a number out.
  if (def.type === 'pipe' && def.in) return isScalarSchema(def.in);
  return false;
}

/**
 * Whether a number at `path` of data of `schema` can be replaced by another number its own leaf schema accepts
 * without parsing the whole again: every object and union on the way down is plain (no refinement over its fields,
 * no transform, a union told apart by a discriminator that is not on the path), so the new number cannot change
 * which option matches nor break a check that reads several fields (a groove wider than its pitch is such a check).
 */
export function numberPatchable(schema: ZodType, path: readonly string[]): boolean {
  let s = schema;
  for (const key of path) {
    let unwrapped = s;
    while (['optional', 'nullable', 'default', 'readonly'].includes(defOf(unwrapped).type) && defOf(unwrapped).innerType) unwrapped = defOf(unwrapped).innerType!;
    const def = defOf(unwrapped);
    if (def.checks && def.checks.length > 0) return false;
    if (def.type === 'union') {
      if (def.discriminator === undefined || def.discriminator === key) return false;
    } else if (def.type !== 'object') return false;
    const child = childSchema(unwrapped, key);
    if (!child) return false;
    s = child;
  }
  return true;
}

/** Read the value at a path of plain data (undefined where the path ends early). */
export function valueAt(value: unknown, path: readonly string[]): unknown {
  let v = value;
  for (const key of path) {
    if (v === null || typeof v !== 'object' || !Object.hasOwn(v, key)) return undefined;
    v = (v as Record<string, unknown>)[key];
  }
  return v;
}

/**
 * A copy of `root` with `value` at `path`: the objects along the path are copied (created where missing),
 * everything else is shared with `root`.
 */
export function withValueAt<T>(root: T, path: readonly string[], value: unknown): T {
  if (path.length === 0) return value as T;
  const [key, ...rest] = path as [string, ...string[]];
  const base = root !== null && typeof root === 'object' && !Array.isArray(root) ? (root as Record<string, unknown>) : {};
  return { ...base, [key]: withValueAt(base[key], rest, value) } as T;
}
