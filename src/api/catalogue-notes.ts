/**
 * What a response says about the catalogue entries it used, read from its
 * echo of the normalised inputs (so only the parts the question used count):
 * the safety notes of each fluid and surfactant (one per entry), and which
 * entries came from the user catalogue rather than the built-in one (a
 * warning, and the file and its hash in the provenance).
 */
import { basename } from 'node:path';
import type { Warning } from '../core/notes.js';
import { fluidOrigin, getFluid } from '../materials/catalogue.js';
import { getSurfactant, surfactantOrigin } from '../materials/surfactants.js';
import { userCatalogue, type CatalogueOrigin } from '../materials/user-catalogue.js';

/** The parts of a design that reference catalogue entries, as they appear in the echo. */
export type CataloguePart = 'lubricant' | 'workingFluid' | 'waterQuality.surfactant';

export interface SafetyNote {
  /** Catalogue id of the fluid or surfactant. */
  id: string;
  name: string;
  /** Where the design uses it. */
  parts: CataloguePart[];
  origin: CatalogueOrigin;
  note: string;
}

export interface UserCatalogueProvenance {
  /** File name (without its directory) of the user catalogue. */
  file: string;
  /** SHA-256 of the file as read at start-up. */
  sha256: string;
  /** The user entries this response used. */
  entries: string[];
}

export interface CatalogueNotes {
  safety: SafetyNote[];
  warnings: Warning[];
  userCatalogue?: UserCatalogueProvenance;
}

function idAt(inputs: unknown, part: CataloguePart): string | undefined {
  let value: unknown = inputs;
  for (const key of part.split('.')) value = typeof value === 'object' && value !== null ? (value as Record<string, unknown>)[key] : undefined;
  const id = typeof value === 'object' && value !== null ? (value as { id?: unknown }).id : undefined;
  return typeof id === 'string' ? id : undefined;
}

const PART_WORDS: Record<CataloguePart, string> = {
  lubricant: 'lubricant',
  workingFluid: 'working fluid',
  'waterQuality.surfactant': 'surfactant',
};

/** Safety notes and user-catalogue notes of the entries an echo of the inputs names. */
export function catalogueNotes(inputs: unknown): CatalogueNotes {
  const safety = new Map<string, SafetyNote>();
  const warnings: Warning[] = [];
  const userEntries: string[] = [];
  for (const part of ['lubricant', 'workingFluid', 'waterQuality.surfactant'] as const) {
    const id = idAt(inputs, part);
    if (id === undefined) continue;
    const isSurfactant = part === 'waterQuality.surfactant';
    const origin = isSurfactant ? surfactantOrigin(id) : fluidOrigin(id);
    const entry = isSurfactant ? getSurfactant(id) : getFluid(id);
    if (origin === undefined || entry === undefined) continue;
    const key = `${isSurfactant ? 's' : 'f'}:${id}`;
    if (entry.safety !== undefined) {
      const known = safety.get(key);
      if (known) known.parts.push(part);
      else safety.set(key, { id, name: entry.name, parts: [part], origin, note: entry.safety });
    }
    if (origin === 'user' && !userEntries.includes(id)) {
      userEntries.push(id);
      warnings.push({
        code: 'user-catalogue-entry',
        severity: 'info',
        message: `${PART_WORDS[part]} "${id}" comes from the user catalogue ${basename(userCatalogue()?.file ?? '')}: its values and sources are the lab's own, not the built-in catalogue's`,
      });
    }
  }
  const user = userCatalogue();
  return {
    safety: [...safety.values()],
    warnings,
    ...(userEntries.length > 0 && user !== undefined ? { userCatalogue: { file: basename(user.file), sha256: user.sha256, entries: userEntries } } : {}),
  };
}
