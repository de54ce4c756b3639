import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PHASES, PROPERTY_CODES, type ReferenceValue } from '@/lib/reference/properties';
import { diffEditions, indexValues } from './diff-editions';
import { rebaseChanges } from './rebase-changes';
import { canonicalValue, compareValues, valueKey } from './value-key';

const value = fc.record({
  species: fc.constantFrom('Ca2+', 'Cl-', 'CaCl2', 'Mg', 'O'),
  phase: fc.constantFrom(...PHASES),
  charge: fc.constant(0),
  property: fc.constantFrom(...PROPERTY_CODES.slice(0, 5)),
  value: fc.integer({ min: -2000, max: 2000 }).map(String),
  uncertainty: fc.constant(null),
  unit: fc.constant('kJ/mol'),
  source: fc.constantFrom('table A', 'table B'),
  fromMemory: fc.boolean(),
}) as fc.Arbitrary<ReferenceValue>;
const edition = fc.array(value, { maxLength: 30 }).map((list) => [...indexValues(list).values()]);
const sorted = (v: readonly ReferenceValue[]) => [...v].map(canonicalValue).sort(compareValues);

/** Apply a diff to its "from" side. */
function apply(from: readonly ReferenceValue[], d: ReturnType<typeof diffEditions>): ReferenceValue[] {
  const m = indexValues(from);
  for (const r of d.removed) m.delete(r.key);
  for (const a of [...d.added, ...d.changed]) m.set(a.key, a.after);
  return [...m.values()];
}

describe('diffEditions', () => {
  it('applying the difference from A to B to A gives B', () => {
    fc.assert(
      fc.property(edition, edition, (a, b) => {
        expect(sorted(apply(a, diffEditions(a, b)))).toEqual(sorted(b));
      }),
    );
  });

  it('an edition compared with itself has no differences', () => {
    fc.assert(
      fc.property(edition, (a) => {
        const d = diffEditions(a, a);
        expect(d.added.length + d.changed.length + d.removed.length).toBe(0);
        expect(d.unchanged).toBe(a.length);
      }),
    );
  });

  it('names the fields that changed', () => {
    const a: ReferenceValue = { species: 'Li', phase: 'g', charge: 0, property: 'ionization_energy_1', value: '520', uncertainty: null, unit: 'kJ/mol', source: 'NIST ASD', fromMemory: false };
    const d = diffEditions([a], [{ ...a, value: '520.2', note: 'restored' }]);
    expect(d.changed[0]!.fields).toEqual(['value', 'note']);
  });
});

describe('rebaseChanges', () => {
  it('with nothing changed upstream, a rebase gives the draft itself and no conflicts', () => {
    fc.assert(
      fc.property(edition, edition, (base, draft) => {
        const r = rebaseChanges(base, draft, base);
        expect(sorted(r.values)).toEqual(sorted(draft));
        expect(r.conflicts).toEqual([]);
      }),
    );
  });

  it('with no changes in the draft, a rebase gives the edition now in force', () => {
    fc.assert(
      fc.property(edition, edition, (base, inForce) => {
        const r = rebaseChanges(base, base, inForce);
        expect(sorted(r.values)).toEqual(sorted(inForce));
        expect(r.carried).toBe(0);
      }),
    );
  });

  it("every one of the draft's changes survives the rebase", () => {
    fc.assert(
      fc.property(edition, edition, edition, (base, draft, inForce) => {
        const r = indexValues(rebaseChanges(base, draft, inForce).values);
        const d = diffEditions(base, draft);
        for (const a of [...d.added, ...d.changed]) expect(r.get(a.key)).toEqual(a.after);
        for (const x of d.removed) expect(r.has(x.key)).toBe(false);
      }),
    );
  });

  it('reports a value changed differently on both sides as a conflict and keeps the draft’s', () => {
    const v = (n: string): ReferenceValue => ({ species: 'CaCl2', phase: 'cr', charge: 0, property: 'enthalpy_of_formation', value: n, uncertainty: null, unit: 'kJ/mol', source: 's', fromMemory: false });
    const r = rebaseChanges([v('-795.4')], [v('-795.42')], [v('-795.8')]);
    expect(r.values.map((x) => x.value)).toEqual(['-795.42']);
    expect(r.conflicts.map((c) => c.key)).toEqual([valueKey(v('0'))]);
    // Both sides made the same change: no conflict.
    expect(rebaseChanges([v('-795.4')], [v('-795.8')], [v('-795.8')]).conflicts).toEqual([]);
  });
});
