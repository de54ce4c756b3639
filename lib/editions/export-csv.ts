// CSV export of an edition, and the downloadable template — both in the change-list format, so an
// exported edition can be edited and imported into a draft as it is.
import Papa from 'papaparse';
import type { ReferenceValue } from '@/lib/reference/properties';
import { CHANGE_COLUMNS } from './schemas';
import { compareValues } from './value-key';

function toRow(v: ReferenceValue): string[] {
  return [
    'set',
    v.species,
    v.phase,
    String(v.charge),
    v.property,
    v.coordination != null ? String(v.coordination) : '',
    v.value,
    v.uncertainty ?? '',
    v.unit,
    v.structure ?? '',
    v.scale ?? '',
    v.source,
    v.fromMemory ? 'yes' : 'no',
    v.note ?? '',
  ];
}

/** UTF-8 with a BOM so spreadsheet programs read the "·" and "Å" correctly. */
export function editionToCsv(values: readonly ReferenceValue[]): string {
  const rows = [...values].sort(compareValues).map(toRow);
  return '\ufeff' + Papa.unparse({ fields: [...CHANGE_COLUMNS], data: rows }, { newline: '\r\n' }) + '\r\n';
}

/** A template: the header and example rows (two sets, one with a converted unit, and a remove). */
export function templateCsv(): string {
  const data = [
    ['set', 'CaCl2', 'cr', '0', 'enthalpy_of_formation', '', '-795.4', '', 'kJ/mol', '', '', 'cite the table, edition and page here', 'no', 'an example row: replace it'],
    ['set', 'Ca2+', 'g', '2', 'ionic_radius', '6', '1.00', '', 'Å', '', '', 'cite the table here', 'no', 'Å is converted to pm on import'],
    ['remove', 'CaCl2·2H2O', 'cr', '0', 'density', '', '', '', '', '', '', '', '', 'removes this value from the draft'],
  ];
  return '\ufeff' + Papa.unparse({ fields: [...CHANGE_COLUMNS], data }, { newline: '\r\n' }) + '\r\n';
}
