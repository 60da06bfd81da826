/** Reading rendered SVG in tests: the data-mark groups of the renderer and the positions of their items. */

/** The items (paths or texts) inside each data-mark group of one kind ('rect', 'symbol', 'line', 'text'). */
export function markItems(svg: string, kind: string): string[][] {
  const groups = [...svg.matchAll(new RegExp(`<g class="mark-${kind} role-mark[^"]*"[^>]*>(.*?)</g>`, 'g'))];
  return groups.map((g) => g[1].match(/<(path|text)\b[^>]*>/g) ?? []);
}

/** The translate(x, y) of an item, in plot-area pixels. */
export function translation(item: string): [number, number] {
  const m = /transform="translate\(([-\d.e]+),([-\d.e]+)\)"/.exec(item);
  if (!m) throw new Error(`no translate in ${item.slice(0, 120)}`);
  return [Number(m[1]), Number(m[2])];
}

/** The fill colour of an item. */
export function fill(item: string): string | undefined {
  return /\bfill="([^"]+)"/.exec(item)?.[1];
}
