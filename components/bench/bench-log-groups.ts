// The bench log's shape, pure: entries and calorimetry sheets grouped per lot, a sheet's own
// entries beside it, and a plain-text search over what a technician would type. No React or DOM.
import type { BenchEntry } from '@/lib/bench/bench-entry-schema';
import type { Sheet } from '@/lib/sheets/sheet-schema';
import type { LocalRecord } from '@/lib/sync/local-state';

export const NO_LOT = '';

export interface CalorimetryVerdict {
  /** The engine's best-match sentence, e.g. which form of the salt the run points to. */
  text: string;
  /** The best match lies within the tolerance. */
  withinTolerance: boolean | null;
  formula: string | null;
  /** Where the verdict came from: the server's recomputation, or this device's (not yet synced). */
  source: 'server' | 'device' | 'none';
}

export interface SheetGroup {
  sheet: LocalRecord<Sheet>;
  verdict: CalorimetryVerdict;
  entries: LocalRecord<BenchEntry>[];
}

export interface LotGroup {
  /** The lot reference, or NO_LOT for entries without one. */
  lot: string;
  sheets: SheetGroup[];
  /** Entries of the lot not tied to one of its calorimetry sheets (newest first). */
  entries: LocalRecord<BenchEntry>[];
  /** ISO time of the newest entry or sheet change, for ordering lots. */
  latest: string;
}

export interface BenchLogContext {
  areaName?: (id: string) => string | undefined;
  sheetTitle?: (id: string) => string | undefined;
}

interface BestMatch {
  formula?: unknown;
  text?: unknown;
  withinTolerance?: unknown;
}

function bestMatchOf(result: unknown): BestMatch | null | undefined {
  if (!result || typeof result !== 'object') return undefined;
  const r = result as { kind?: unknown; result?: { bestMatch?: unknown }; errors?: unknown };
  if (Array.isArray(r.errors)) return null;
  if (r.kind !== 'calorimetry' || !r.result || typeof r.result !== 'object') return undefined;
  return (r.result.bestMatch ?? null) as BestMatch | null;
}

/** The verdict of a calorimetry sheet: the server's result when it has one, else the device's. */
export function calorimetryVerdict(record: LocalRecord<Sheet>): CalorimetryVerdict {
  const fromServer = record.pending ? undefined : bestMatchOf(record.serverResult);
  const fromDevice = bestMatchOf(record.content.result);
  const best = fromServer ?? fromDevice;
  const source = fromServer !== undefined ? 'server' : fromDevice !== undefined ? 'device' : 'none';
  if (!best || typeof best.text !== 'string') {
    return { text: best === null ? 'No match: the run does not point to any candidate form.' : 'Not solved yet.', withinTolerance: null, formula: null, source };
  }
  return { text: best.text, withinTolerance: typeof best.withinTolerance === 'boolean' ? best.withinTolerance : null, formula: typeof best.formula === 'string' ? best.formula : null, source };
}

const norm = (s: string) => s.normalize('NFKD').toLowerCase();

/** Every word of the query must appear in the entry's note, lot, tags, area, sheet title or id. */
export function entryMatches(e: BenchEntry, query: string, ctx: BenchLogContext = {}): boolean {
  const words = norm(query).split(/\s+/).filter(Boolean);
  if (words.length === 0) return true;
  const hay = norm(
    [e.note, e.lotRef ?? '', ...e.tags.map((t) => `#${t} ${t}`), e.areaId ? (ctx.areaName?.(e.areaId) ?? '') : '', e.sheetId ? (ctx.sheetTitle?.(e.sheetId) ?? '') : ''].join(' \u0000 '),
  );
  return words.every((w) => hay.includes(w));
}

export function sheetMatches(s: Sheet, query: string): boolean {
  const words = norm(query).split(/\s+/).filter(Boolean);
  const hay = norm(`${s.title} ${s.lotRef ?? ''} ${s.note}`);
  return words.every((w) => hay.includes(w));
}

/**
 * Group the site's bench entries and calorimetry sheets per lot. With a query, a lot shows the
 * entries that match and the sheets that match (or carry a matching entry); lots with nothing
 * matching are left out. Lots are ordered by their newest activity.
 */
export function groupBenchLog(entries: LocalRecord<BenchEntry>[], calorimetrySheets: LocalRecord<Sheet>[], query = '', ctx: BenchLogContext = {}): LotGroup[] {
  const lots = new Map<string, LotGroup>();
  const lotOf = (ref: string | null) => {
    const key = ref?.trim() ?? NO_LOT;
    let g = lots.get(key);
    if (!g) lots.set(key, (g = { lot: key, sheets: [], entries: [], latest: '' }));
    return g;
  };
  const searching = query.trim() !== '';
  const sheetGroups = new Map<string, SheetGroup & { lot: string; matches: boolean }>();
  for (const s of calorimetrySheets) {
    if (s.content.deleted || s.content.kind !== 'calorimetry') continue;
    sheetGroups.set(s.id, { sheet: s, verdict: calorimetryVerdict(s), entries: [], lot: s.content.lotRef?.trim() ?? NO_LOT, matches: !searching || sheetMatches(s.content, query) });
  }
  const looseEntries: LocalRecord<BenchEntry>[] = [];
  for (const e of entries) {
    if (e.content.deleted || !entryMatches(e.content, query, ctx)) continue;
    const home = e.content.sheetId ? sheetGroups.get(e.content.sheetId) : undefined;
    if (home && home.lot === (e.content.lotRef?.trim() ?? NO_LOT)) home.entries.push(e);
    else looseEntries.push(e);
  }
  for (const g of sheetGroups.values()) {
    if (!g.matches && g.entries.length === 0) continue;
    const lot = lotOf(g.lot);
    lot.sheets.push({ sheet: g.sheet, verdict: g.verdict, entries: g.entries });
    const times = [g.sheet.content.updatedAt, ...g.entries.map((e) => e.content.createdAt)];
    for (const t of times) if (t > lot.latest) lot.latest = t;
  }
  for (const e of looseEntries) {
    const lot = lotOf(e.content.lotRef);
    lot.entries.push(e);
    if (e.content.createdAt > lot.latest) lot.latest = e.content.createdAt;
  }
  const byNewest = (a: { content: { createdAt: string } }, b: { content: { createdAt: string } }) => (a.content.createdAt < b.content.createdAt ? 1 : -1);
  const out = [...lots.values()];
  for (const g of out) {
    g.entries.sort(byNewest);
    g.sheets.sort((a, b) => (a.sheet.content.updatedAt < b.sheet.content.updatedAt ? 1 : -1));
    for (const s of g.sheets) s.entries.sort(byNewest);
  }
  // Lots by newest activity; entries without a lot last.
  return out.sort((a, b) => (a.lot === NO_LOT ? 1 : b.lot === NO_LOT ? -1 : a.latest < b.latest ? 1 : -1));
}

/** Tags as typed ("dissolver, label  #seal") → clean, unique tags. */
export function parseTags(text: string): string[] {
  const seen = new Set<string>();
  for (const raw of text.split(/[,\n]+/)) {
    const t = raw.trim().replace(/^#/, '').trim();
    if (t) seen.add(t.slice(0, 40));
  }
  return [...seen];
}
