'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { type Resolver, useForm } from 'react-hook-form';
import { postJson } from '@/components/ui/post-json';
import { changeRowSchema } from '@/lib/editions/form-schemas';
import { HYDRATION_SCALES, PHASES, PROPERTIES, PROPERTY_CODES, type ReferenceValue } from '@/lib/reference/properties';

export interface ValueEditorProps {
  editionId: string;
  revision: number;
  /** A value picked from the draft's table to change or remove; the form is filled with it. */
  picked: ReferenceValue | null;
}

type Row = {
  action: 'set' | 'remove';
  species: string;
  phase: string;
  charge: string;
  property: string;
  coordination: string;
  value: string;
  std_uncertainty: string;
  unit: string;
  structure: string;
  hydration_scale: string;
  source: string;
  from_memory: string;
  note: string;
};

const EMPTY: Row = {
  action: 'set', species: '', phase: 'cr', charge: '0', property: 'enthalpy_of_formation', coordination: '', value: '', std_uncertainty: '',
  unit: 'kJ/mol', structure: '', hydration_scale: '', source: '', from_memory: 'no', note: '',
};

function fromValue(v: ReferenceValue): Row {
  return {
    action: 'set', species: v.species, phase: v.phase, charge: String(v.charge), property: v.property, coordination: v.coordination != null ? String(v.coordination) : '',
    value: v.value, std_uncertainty: v.uncertainty ?? '', unit: v.unit, structure: v.structure ?? '', hydration_scale: v.scale ?? '',
    source: v.source, from_memory: v.fromMemory ? 'yes' : 'no', note: v.note ?? '',
  };
}

const FIELDS: { name: keyof Row; label: string; kind?: 'select'; options?: readonly string[]; wide?: boolean }[] = [
  { name: 'action', label: 'Action', kind: 'select', options: ['set', 'remove'] },
  { name: 'species', label: 'Species (formula)' },
  { name: 'phase', label: 'Phase', kind: 'select', options: PHASES },
  { name: 'charge', label: 'Charge' },
  { name: 'property', label: 'Property', kind: 'select', options: PROPERTY_CODES },
  { name: 'coordination', label: 'Coordination (radii only)' },
  { name: 'value', label: 'Value' },
  { name: 'std_uncertainty', label: 'Standard uncertainty' },
  { name: 'unit', label: 'Unit (converted to the stored unit)' },
  { name: 'structure', label: 'Structure type' },
  { name: 'hydration_scale', label: 'Hydration scale', kind: 'select', options: ['', ...HYDRATION_SCALES] },
  { name: 'from_memory', label: 'From memory?', kind: 'select', options: ['no', 'yes'] },
  { name: 'source', label: 'Source (table, edition, page)', wide: true },
  { name: 'note', label: 'Note', wide: true },
];

/** Set or remove one value in a draft; the same checks as a CSV row, in the browser and on the server. */
export function ValueEditor({ editionId, revision, picked }: ValueEditorProps) {
  const qc = useQueryClient();
  const [message, setMessage] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);
  const form = useForm<Row>({ resolver: zodResolver(changeRowSchema) as unknown as Resolver<Row>, defaultValues: EMPTY });
  const { errors, isSubmitting } = form.formState;
  useEffect(() => {
    if (picked) form.reset(fromValue(picked));
  }, [picked, form]);

  const onSubmit = form.handleSubmit(async (row) => {
    const res = await postJson<{ counts: Record<string, number> }>(`/api/v1/editions/${editionId}/changes`, { changes: [row], revision });
    if (res.ok) {
      const c = res.data.counts;
      setMessage({ kind: 'ok', text: c.unchanged ? 'No change: the draft already holds exactly this value.' : `Saved (${c.added} added, ${c.changed} changed, ${c.removed} removed).` });
      form.reset(EMPTY);
      void qc.invalidateQueries({ queryKey: ['editions'] });
    } else {
      for (const f of res.fields ?? []) {
        const column = f.field.split('.')[1] as keyof Row | undefined;
        if (column && column in EMPTY) form.setError(column, { message: f.message });
      }
      setMessage({ kind: 'error', text: res.message });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="panel space-y-3" aria-labelledby="value-editor-title">
      <h2 id="value-editor-title">Set or remove a value</h2>
      <p className="text-sm text-ink-soft">Pick “Edit” on a row below to change it, or fill in a new value. Electron-gain enthalpies are signed (negative for the halogens).</p>
      <div className="grid gap-3 sm:grid-cols-2">
        {FIELDS.map((f) => (
          <div key={f.name} className={f.wide ? 'sm:col-span-2' : ''}>
            <label htmlFor={`ve-${f.name}`} className="field-label">
              {f.label}
            </label>
            {f.kind === 'select' ? (
              <select id={`ve-${f.name}`} className="field-input" aria-invalid={!!errors[f.name]} {...form.register(f.name)}>
                {f.options!.map((o) => (
                  <option key={o} value={o}>
                    {f.name === 'property' ? `${PROPERTIES[o as keyof typeof PROPERTIES].label} (${o})` : o || '(none)'}
                  </option>
                ))}
              </select>
            ) : (
              <input id={`ve-${f.name}`} className="field-input" aria-invalid={!!errors[f.name]} {...form.register(f.name)} />
            )}
            {errors[f.name] ? <p className="field-error">{errors[f.name]?.message}</p> : null}
          </div>
        ))}
      </div>
      <div className="flex flex-wrap gap-3">
        <button type="submit" className="btn-primary" disabled={isSubmitting}>
          Save to the draft
        </button>
        <button type="button" className="btn-quiet" onClick={() => form.reset(EMPTY)}>
          Clear the form
        </button>
      </div>
      {message ? (
        <p role={message.kind === 'error' ? 'alert' : 'status'} className={message.kind === 'error' ? 'field-error' : 'text-sm text-verdigris-700'}>
          {message.text}
        </p>
      ) : null}
    </form>
  );
}
