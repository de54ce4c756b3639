// Parse and validate a change-list CSV. Every row is checked; any error means nothing is applied.
import Papa from 'papaparse';
import { CHANGE_COLUMNS, type ChangeColumn, changeRowSchema, LIMITS, REQUIRED_COLUMNS, rowToChange, type ValueChange } from './schemas';

/** `row` counts the file's records with the header as row 1; `column` is a header name, or null for the whole row. */
export interface RowError {
  row: number;
  column: string | null;
  message: string;
}

export interface ParsedRow {
  row: number;
  change: ValueChange;
}

export type ParseResult = { ok: true; rows: ParsedRow[] } | { ok: false; errors: RowError[] };

/** Decode uploaded bytes as UTF-8 (a BOM is dropped); anything else is refused. */
export function decodeUtf8(bytes: Uint8Array): { ok: true; text: string } | { ok: false; errors: RowError[] } {
  if (bytes.byteLength === 0) return { ok: false, errors: [{ row: 1, column: null, message: 'the file is empty' }] };
  if (bytes.byteLength > LIMITS.maxBytes) {
    return { ok: false, errors: [{ row: 1, column: null, message: `the file is larger than ${LIMITS.maxBytes / 1024 / 1024} MiB; split it into smaller change lists` }] };
  }
  try {
    return { ok: true, text: new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes) };
  } catch {
    return { ok: false, errors: [{ row: 1, column: null, message: 'the file is not UTF-8 text; save it as "CSV UTF-8" and try again' }] };
  }
}

export function parseChangeCsv(input: string): ParseResult {
  const text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  if (text.trim() === '') return { ok: false, errors: [{ row: 1, column: null, message: 'the file is empty' }] };
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: false, delimiter: ',' });
  const errors: RowError[] = [];
  for (const e of parsed.errors) errors.push({ row: (e.row ?? 0) + 1, column: null, message: `CSV format: ${e.message}` });

  const records = parsed.data;
  const header = (records[0] ?? []).map((h) => h.trim().toLowerCase());
  const known = new Set<string>(CHANGE_COLUMNS);
  const seen = new Set<string>();
  header.forEach((h, i) => {
    if (!known.has(h)) errors.push({ row: 1, column: h || `(column ${i + 1})`, message: `unknown column "${h}"; the columns are ${CHANGE_COLUMNS.join(', ')}` });
    if (seen.has(h)) errors.push({ row: 1, column: h, message: `column "${h}" appears twice` });
    seen.add(h);
  });
  for (const c of REQUIRED_COLUMNS) if (!seen.has(c)) errors.push({ row: 1, column: c, message: `the header has no "${c}" column` });
  if (errors.some((e) => e.row === 1)) return { ok: false, errors: dedupe(errors) };

  const body = records.slice(1);
  const dataRows = body.filter((r) => !(r.length === 1 && r[0]!.trim() === '')).length;
  if (dataRows === 0) return { ok: false, errors: [{ row: 2, column: null, message: 'the file has a header but no rows' }] };
  if (dataRows > LIMITS.maxRows) {
    return { ok: false, errors: [{ row: LIMITS.maxRows + 2, column: null, message: `the file has ${dataRows} rows; at most ${LIMITS.maxRows} are accepted in one import` }] };
  }

  const rows: ParsedRow[] = [];
  body.forEach((record, i) => {
    const row = i + 2;
    if (record.length === 1 && record[0]!.trim() === '') return; // blank line
    if (record.length !== header.length) {
      errors.push({ row, column: null, message: `this row has ${record.length} fields but the header has ${header.length}` });
      return;
    }
    const fields = Object.fromEntries(header.map((h, j) => [h, record[j] ?? '']));
    const result = validateChangeRow(fields);
    if (result.ok) rows.push({ row, change: result.change });
    else for (const e of result.errors) errors.push({ row, ...e });
  });
  if (errors.length) return { ok: false, errors: dedupe(errors) };
  return { ok: true, rows };
}

/** Validate one row (CSV or editor form) and turn it into a change in stored units. */
export function validateChangeRow(fields: Record<string, unknown>): { ok: true; change: ValueChange } | { ok: false; errors: { column: string; message: string }[] } {
  const parsed = changeRowSchema.safeParse(fields);
  if (!parsed.success) {
    return { ok: false, errors: parsed.error.issues.map((i) => ({ column: String(i.path[0] ?? 'row') as ChangeColumn, message: i.message })) };
  }
  return { ok: true, change: rowToChange(parsed.data) };
}

function dedupe(errors: RowError[]): RowError[] {
  const seen = new Set<string>();
  return errors
    .filter((e) => {
      const k = `${e.row}|${e.column}|${e.message}`;
      if (seen.has(k)) return false;
      seen.add(k);
      return true;
    })
    .sort((a, b) => a.row - b.row);
}
