import { describe, expect, it } from 'vitest';
import type { BenchEntry } from '@/lib/bench/bench-entry-schema';
import type { Sheet } from '@/lib/sheets/sheet-schema';
import type { LocalRecord } from '@/lib/sync/local-state';
import { calorimetryVerdict, entryMatches, groupBenchLog, NO_LOT, parseTags } from './bench-log-groups';

let n = 0;
const id = () => `0190a1b2-0000-7000-8000-${String(++n).padStart(12, '0')}`;
const rec = <T,>(content: T, extra: Partial<LocalRecord<T>> = {}): LocalRecord<T> => ({ entity: 'bench_entry', id: (content as { id: string }).id, content, serverContent: content, serverRevision: 1, serverSeq: 1, awaitingReview: false, pending: false, ...extra });
const entry = (f: Partial<BenchEntry>): LocalRecord<BenchEntry> =>
  rec({ id: id(), note: '', lotRef: null, areaId: null, tags: [], sheetId: null, photoIds: [], authorId: 'u1', deleted: false, createdAt: '2026-11-26T08:00:00.000Z', updatedAt: '2026-11-26T08:00:00.000Z', ...f });
const calorimetry = (f: Partial<Sheet>, serverResult?: unknown): LocalRecord<Sheet> =>
  ({ ...rec({ id: id(), kind: 'calorimetry', title: 'Run', lotRef: null, areaId: null, note: '', status: 'draft', problem: null, inputs: [], result: null, pinnedEditionId: null, engineVersion: null, version: 1, previousVersionId: null, authorId: 'u1', signedOffBy: null, signedOffAt: null, deleted: false, createdAt: '2026-11-26T07:00:00.000Z', updatedAt: '2026-11-26T07:00:00.000Z', ...f } as Sheet), entity: 'sheet', serverResult });
const solved = (text: string, withinTolerance = true) => ({ kind: 'calorimetry', engineVersion: 'x', result: { bestMatch: { formula: 'LiCl', differenceKjPerMol: '0.4', withinTolerance, text } } });

describe('groupBenchLog', () => {
  it('puts a sheet’s entries under the sheet and the rest under their lot, lots by newest activity, no lot last', () => {
    const run = calorimetry({ lotRef: 'CR-LC-2611-04', title: 'Run 1', updatedAt: '2026-11-26T09:00:00.000Z' }, solved('Best match: anhydrous LiCl'));
    const onRun = entry({ lotRef: 'CR-LC-2611-04', sheetId: run.id, note: 'Bath steady', createdAt: '2026-11-26T09:30:00.000Z' });
    const loose = entry({ lotRef: 'CR-LC-2611-04', note: 'Label photo' });
    const brine = entry({ lotRef: 'CR-CB-2611-12', note: 'Brine sample', createdAt: '2026-11-26T10:00:00.000Z' });
    const none = entry({ note: 'Scale calibrated', createdAt: '2026-11-27T10:00:00.000Z' });
    const groups = groupBenchLog([onRun, loose, brine, none], [run]);
    expect(groups.map((g) => g.lot)).toEqual(['CR-CB-2611-12', 'CR-LC-2611-04', NO_LOT]);
    const lc = groups[1]!;
    expect(lc.sheets).toHaveLength(1);
    expect(lc.sheets[0]!.entries.map((e) => e.id)).toEqual([onRun.id]);
    expect(lc.sheets[0]!.verdict).toMatchObject({ text: 'Best match: anhydrous LiCl', source: 'server', withinTolerance: true });
    expect(lc.entries.map((e) => e.id)).toEqual([loose.id]);
  });

  it('a search keeps only matching entries and sheets, and leaves out tombstones', () => {
    const run = calorimetry({ lotRef: 'CR-LC-2611-04', title: 'Dissolution check' });
    const a = entry({ lotRef: 'CR-LC-2611-04', note: 'Seal on drum 3 broken', tags: ['label'] });
    const b = entry({ lotRef: 'CR-LC-2611-04', note: 'Seal fine', deleted: true });
    const c = entry({ lotRef: 'CR-CB-2611-12', note: 'Density 1.39' });
    expect(groupBenchLog([a, b, c], [run], 'seal').flatMap((g) => g.entries.map((e) => e.id))).toEqual([a.id]);
    expect(groupBenchLog([a, b, c], [run], '#label')[0]!.entries.map((e) => e.id)).toEqual([a.id]);
    const bySheet = groupBenchLog([a, c], [run], 'dissolution');
    expect(bySheet).toHaveLength(1);
    expect(bySheet[0]!.sheets).toHaveLength(1);
    expect(groupBenchLog([a, b, c], [run], 'nothing-like-this')).toEqual([]);
  });
});

describe('calorimetryVerdict', () => {
  it('prefers the server’s result unless a local edit waits, and says when a run is not solved', () => {
    const s = calorimetry({ result: solved('device says hexahydrate') }, solved('server says anhydrous'));
    expect(calorimetryVerdict(s).text).toBe('server says anhydrous');
    expect(calorimetryVerdict({ ...s, pending: true }).text).toBe('device says hexahydrate');
    expect(calorimetryVerdict(calorimetry({})).text).toBe('Not solved yet.');
    expect(calorimetryVerdict(calorimetry({}, { errors: [{ field: 'x', message: 'y' }] })).source).toBe('server');
  });
});

describe('search words and tags', () => {
  it('matches every word anywhere, including area names', () => {
    const e = entry({ note: 'Gauge read 2.4 bar', areaId: 'a1', tags: ['pressure'] }).content;
    expect(entryMatches(e, 'gauge dissolver', { areaName: () => 'Dissolver hall' })).toBe(true);
    expect(entryMatches(e, 'gauge lab', { areaName: () => 'Dissolver hall' })).toBe(false);
  });
  it('parses comma-separated tags, dropping # and duplicates', () => {
    expect(parseTags(' dissolver, #label,, label ,seal\nqc')).toEqual(['dissolver', 'label', 'seal', 'qc']);
  });
});
