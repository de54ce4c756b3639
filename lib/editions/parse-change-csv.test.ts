import { describe, expect, it } from 'vitest';
import { STARTER_EDITION_VALUES } from '@/db/seed/starter-edition';
import { convertToStoredUnit } from './convert-unit';
import { editionToCsv, templateCsv } from './export-csv';
import { decodeUtf8, parseChangeCsv } from './parse-change-csv';
import { planChanges } from './plan-changes';
import { canonicalValue, compareValues } from './value-key';

const HEADER = 'action,species,phase,charge,property,coordination,value,std_uncertainty,unit,structure,hydration_scale,source,from_memory,note';

describe('parseChangeCsv', () => {
  it('an exported edition parses back to the same values', () => {
    const parsed = parseChangeCsv(editionToCsv(STARTER_EDITION_VALUES));
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const plan = planChanges([], parsed.rows);
    expect(plan.ok).toBe(true);
    if (!plan.ok) return;
    const norm = (v: typeof STARTER_EDITION_VALUES) => [...v].map(canonicalValue).sort(compareValues);
    expect(norm(plan.values)).toEqual(norm(STARTER_EDITION_VALUES));
  });

  it('the template parses without errors', () => {
    expect(parseChangeCsv(templateCsv()).ok).toBe(true);
  });

  it('reports every bad row, by row and column, not only the first', () => {
    const r = parseChangeCsv([HEADER, 'set,Qq,cr,0,enthalpy_of_formation,,-1,,kJ/mol,,,s,no,', 'set,CaO,cr,0,enthalpy_of_formation,,1e3,,kJ/mol,,,s,no,'].join('\n'));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.map((e) => [e.row, e.column])).toEqual([
      [2, 'species'],
      [3, 'value'],
    ]);
  });

  it('an over-long or unknown property code is a row error naming the column, never a crash', () => {
    const long = 'enthalpy_of_formation_of_the_solid_at_298_kelvin';
    const r = parseChangeCsv([HEADER, `set,CaO,cr,0,${long},,-634.9,,kJ/mol,,,s,no,`, 'set,CaO,cr,0,heat_of_everything,,-634.9,,kJ/mol,,,s,no,', 'remove,CaO,cr,0,x,,,,,,,,,'].join('\n'));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.map((e) => [e.row, e.column])).toEqual([
      [2, 'property'],
      [3, 'property'],
      [4, 'property'],
    ]);
  });

  it('quoted fields may hold commas and line breaks', () => {
    const r = parseChangeCsv(`${HEADER}\nset,CaO,cr,0,enthalpy_of_formation,,-634.9,,kJ/mol,,,"CRC Handbook, section 5","no","two\nlines"\n`);
    expect(r.ok).toBe(true);
  });

  it('refuses bytes that are not UTF-8 and drops a BOM', () => {
    expect(decodeUtf8(new Uint8Array([0x61, 0xff])).ok).toBe(false);
    const d = decodeUtf8(new Uint8Array([0xef, 0xbb, 0xbf, 0x61]));
    expect(d.ok && d.text).toBe('a');
  });
});

describe('convertToStoredUnit', () => {
  it('converts kcal/mol exactly and eV to the significant figures given', () => {
    // 1 thermochemical kcal = 4.184 kJ exactly — NIST SP 811, appendix B.8
    expect(convertToStoredUnit('enthalpy_of_formation', 'kcal/mol', '-98.62', null)).toMatchObject({ ok: true, value: '-412.62608' });
    // Na first ionization energy 5.13907696 eV = 495.8455 kJ/mol — NIST ASD, converted with e·N_A (CODATA 2018)
    const na = convertToStoredUnit('ionization_energy_1', 'eV', '5.13907696', null);
    expect(na.ok && Number(na.value)).toBeCloseTo(495.84551, 4);
    expect(convertToStoredUnit('ionic_radius', 'Å', '1.02', '0.01')).toMatchObject({ ok: true, value: '102', uncertainty: '1' });
    expect(convertToStoredUnit('ionic_radius', 'kJ/mol', '1', null).ok).toBe(false);
  });
});
