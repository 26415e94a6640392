/** One field of a conflicting edit: the person's value beside the server's. */
export type ConflictRow = { path: string; mine: string; server: string };

/** Fields of a write that only steer the sync itself, never shown to the person. */
const HIDDEN = new Set(['baseVersion', 'id']);
const MAX_ROWS = 40;

function shown(value: unknown): string {
  if (value === undefined || value === null || value === '') return '—';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
}

const isPlainObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

function walk(mine: unknown, server: unknown, path: string, rows: ConflictRow[]): void {
  if (rows.length >= MAX_ROWS) return;
  if (isPlainObject(mine) && isPlainObject(server)) {
    for (const key of Object.keys(mine)) {
      if (path === '' && HIDDEN.has(key)) continue;
      walk(mine[key], server[key], path ? `${path}.${key}` : key, rows);
    }
    return;
  }
  if (Array.isArray(mine) && Array.isArray(server) && mine.length === server.length) {
    mine.forEach((entry, i) => walk(entry, server[i], `${path}.${i + 1}`, rows));
    return;
  }
  if (JSON.stringify(mine) !== JSON.stringify(server))
    rows.push({ path, mine: shown(mine), server: shown(server) });
}

/**
 * The fields a person's edit sets that differ from the server's current record, leaf by leaf
 * ("input.spanFt"), in the order of the edit; at most 40.
 *
 * @example conflictRows({ name: 'A', baseVersion: 2 }, { name: 'B', version: 3 }) // [{ path: 'name', mine: 'A', server: 'B' }]
 */
export function conflictRows(mine: unknown, server: unknown): ConflictRow[] {
  const rows: ConflictRow[] = [];
  walk(mine, isPlainObject(server) ? server : {}, '', rows);
  return rows;
}

/** "input.sources.2.tributaryFt" → "Input › sources › 2 › tributary ft", for a row's heading. */
export function fieldLabel(path: string): string {
  return path
    .split('.')
    .map((part) => part.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase())
    .join(' › ')
    .replace(/^./, (c) => c.toUpperCase());
}
