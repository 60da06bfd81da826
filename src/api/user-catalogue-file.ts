/**
 * Reading a user catalogue file (OILSKIN_CATALOGUE_FILE, or `--catalogue
 * file` on the command line) at start-up: JSON, or YAML when the name ends in
 * .yaml/.yml. A file that cannot be read or does not validate stops start-up
 * with one message naming the file, the entry and the field; nothing of it is
 * installed. Ids must be new: an id that repeats, or that a built-in entry
 * already has, is refused (the built-in catalogue is never shadowed).
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { parse as parseYaml } from 'yaml';
import { FLUIDS } from '../materials/catalogue.js';
import { FORMER_SURFACTANT_IDS, SURFACTANTS } from '../materials/surfactants.js';
import { installUserCatalogue, type UserCatalogueData } from '../materials/user-catalogue.js';
import { zodFieldErrors } from './problem.js';
import { UserCatalogueFileSchema } from './schemas/user-catalogue.js';

/** Largest catalogue file read, bytes: a lab's list, not a database dump. */
const MAX_FILE_BYTES = 2 * 1024 * 1024;

/** Why a user catalogue was refused; the message names the file, the entry and the field. */
export class CatalogueFileError extends Error {
  constructor(
    readonly file: string,
    readonly problems: readonly string[],
  ) {
    super(`user catalogue ${file} is not valid:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
    this.name = 'CatalogueFileError';
  }
}

/** "fluids[1] (id "lab-oil").properties.viscosity" from "fluids[1].properties.viscosity" and the raw file. */
function describePath(path: string, raw: unknown): string {
  const match = /^(fluids|surfactants)\[(\d+)\](.*)$/.exec(path);
  if (!match) return path || '(top level)';
  const [, list, index, rest] = match;
  const entry = (raw as Record<string, unknown[] | undefined>)[list!]?.[Number(index)];
  const id = typeof entry === 'object' && entry !== null ? (entry as { id?: unknown }).id : undefined;
  const named = typeof id === 'string' ? ` (id "${id.slice(0, 64)}")` : '';
  return `${list}[${index}]${named}${rest}`;
}

function parseText(file: string, content: string): unknown {
  try {
    return /\.ya?ml$/i.test(file) ? parseYaml(content, { maxAliasCount: 100 }) : JSON.parse(content);
  } catch (error) {
    throw new CatalogueFileError(file, [`cannot be parsed as ${/\.ya?ml$/i.test(file) ? 'YAML' : 'JSON'}: ${(error as Error).message}`]);
  }
}

/** Read and validate a user catalogue file; throws {@link CatalogueFileError}. Nothing is installed. */
export function readUserCatalogue(file: string): UserCatalogueData {
  let bytes: Buffer;
  try {
    bytes = readFileSync(file);
  } catch (error) {
    throw new CatalogueFileError(file, [`cannot be read: ${(error as Error).message}`]);
  }
  if (bytes.length > MAX_FILE_BYTES) throw new CatalogueFileError(file, [`is ${bytes.length} bytes, more than the ${MAX_FILE_BYTES} a catalogue file may have`]);
  const raw = parseText(file, bytes.toString('utf8'));
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    throw new CatalogueFileError(file, ['must be an object with "fluids" and/or "surfactants" lists']);
  }
  const parsed = UserCatalogueFileSchema.safeParse(raw);
  if (!parsed.success) {
    throw new CatalogueFileError(file, zodFieldErrors(parsed.error).map((e) => `${describePath(e.path, raw)}: ${e.message}`));
  }
  const fluids = parsed.data.fluids ?? [];
  const surfactants = parsed.data.surfactants ?? [];
  const problems: string[] = [];
  const checkIds = (list: 'fluids' | 'surfactants', ids: string[], builtIn: Set<string>) => {
    const seen = new Set<string>();
    ids.forEach((id, i) => {
      if (builtIn.has(id)) problems.push(`${list}[${i}] (id "${id}").id: "${id}" is a built-in entry; a user entry must have an id of its own (the built-in catalogue is never shadowed)`);
      else if (seen.has(id)) problems.push(`${list}[${i}] (id "${id}").id: "${id}" appears twice in the file`);
      seen.add(id);
    });
  };
  checkIds('fluids', fluids.map((f) => f.id), new Set(FLUIDS.map((f) => f.id)));
  // A former built-in id (it still resolves to its entry) is reserved like a current one.
  checkIds('surfactants', surfactants.map((s) => s.id), new Set([...SURFACTANTS.map((s) => s.id), ...Object.keys(FORMER_SURFACTANT_IDS)]));
  if (fluids.length + surfactants.length === 0) problems.push('(top level): the file has no fluids and no surfactants');
  if (problems.length > 0) throw new CatalogueFileError(file, problems);
  return {
    file,
    sha256: createHash('sha256').update(bytes).digest('hex'),
    ...(parsed.data.title === undefined ? {} : { title: parsed.data.title }),
    fluids,
    surfactants,
  };
}

/** Read, validate and install a user catalogue; returns its data (for the solver threads). */
export function loadUserCatalogue(file: string): UserCatalogueData {
  const data = readUserCatalogue(file);
  installUserCatalogue(data);
  return data;
}
