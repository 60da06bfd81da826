/**
 * Citations. A reference is defined once, with its DOI where one exists, and
 * cited by key from every module that rests on it.
 */

export interface Reference {
  /** Short key, e.g. `dean1978`. */
  key: string;
  /** Full citation: authors, year, title, journal, volume, pages. */
  citation: string;
  doi?: string;
}
