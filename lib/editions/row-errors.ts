// Row-level errors as the API's one error type: 422, every error named by row and column.
import { AppError } from '@/lib/server/errors';
import type { RowError } from './parse-change-csv';

export function rowErrors(errors: RowError[], what: 'file' | 'change'): AppError {
  const shown = errors.slice(0, 3).map((e) => `row ${e.row}${e.column ? `, ${e.column}` : ''}: ${e.message}`);
  const more = errors.length > 3 ? ` (and ${errors.length - 3} more)` : '';
  const lead = what === 'file' ? 'Nothing was imported' : 'Nothing was changed';
  return new AppError('validation', `${lead}: ${errors.length} error${errors.length === 1 ? '' : 's'} — ${shown.join('; ')}${more}.`, {
    rows: errors,
    fields: errors.map((e) => ({ field: `row ${e.row}${e.column ? `.${e.column}` : ''}`, message: e.message })),
  });
}
