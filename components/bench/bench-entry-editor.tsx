'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/ui/form-alert';
import { newBenchEntry, saveBenchEntry, savePhoto, syncNow, useBenchEntries, useSheets, type BenchEntry, type LocalRecord } from '@/lib/local';
import { formatBytes } from '@/lib/photos/photo-limits';
import { isZodError } from '@/lib/validation/zod-mini';
import { parseTags } from './bench-log-groups';
import { benchEntryFormSchema, type BenchEntryFormValues } from './bench-entry-form-schema';
import { useBenchSite } from './bench-site-context';
import { PhotoPicker, type PickedPhoto } from './photo-picker';

export interface BenchEntryEditorProps {
  /** The entry to edit; absent for a new one. */
  existing?: LocalRecord<BenchEntry>;
  defaults?: { lotRef?: string; sheetId?: string };
  onSaved: (id: string) => void;
  onCancel: () => void;
}

/** Create or edit a bench entry on this device (online or offline); photos are kept as blobs until synced. */
export function BenchEntryEditor({ existing, defaults, onSaved, onCancel }: BenchEntryEditorProps) {
  const { identity, areas } = useBenchSite();
  const entry = existing?.content;
  const form = useForm<BenchEntryFormValues>({
    resolver: zodResolver(benchEntryFormSchema),
    defaultValues: {
      lotRef: entry?.lotRef ?? defaults?.lotRef ?? '',
      note: entry?.note ?? '',
      areaId: entry?.areaId ?? '',
      tags: entry?.tags.join(', ') ?? '',
      sheetId: entry?.sheetId ?? defaults?.sheetId ?? '',
    },
  });
  const { errors, isSubmitting } = form.formState;
  const [photos, setPhotos] = useState<PickedPhoto[]>([]);
  const [saveError, setSaveError] = useState<string | null>(null);
  const lot = form.watch('lotRef').trim();
  const sheets = useSheets();
  const allEntries = useBenchEntries();
  const knownLots = useMemo(() => {
    const s = new Set<string>();
    for (const e of allEntries ?? []) if (e.content.lotRef) s.add(e.content.lotRef);
    for (const r of sheets ?? []) if (r.content.lotRef) s.add(r.content.lotRef);
    return [...s].sort();
  }, [allEntries, sheets]);
  const chosenSheet = form.watch('sheetId');
  // The chosen sheet always stays among the options (else the select would show "none" while the form keeps the id).
  const sheetChoices = (sheets ?? []).filter((s) => !s.content.deleted && ((lot && s.content.lotRef === lot) || s.id === chosenSheet)).map((s) => ({ id: s.id, label: `${s.content.title} (${s.content.kind})` }));
  if (chosenSheet && sheets && !sheetChoices.some((c) => c.id === chosenSheet)) sheetChoices.push({ id: chosenSheet, label: 'A sheet not on this device yet' });

  const previews = useMemo(() => photos.map((p) => ({ id: p.id, url: URL.createObjectURL(p.blob) })), [photos]);
  useEffect(() => () => previews.forEach((p) => URL.revokeObjectURL(p.url)), [previews]);

  const onSubmit = form.handleSubmit(async (values) => {
    setSaveError(null);
    if (!values.note.trim() && photos.length === 0 && (entry?.photoIds.length ?? 0) === 0) {
      form.setError('note', { message: 'Write a note or add a photo' });
      return;
    }
    const fields = {
      note: values.note,
      lotRef: values.lotRef.trim(),
      areaId: values.areaId || null,
      tags: parseTags(values.tags),
      sheetId: values.sheetId || null,
    };
    try {
      const base: BenchEntry = entry ? { ...entry, ...fields } : newBenchEntry(fields);
      const saved = await saveBenchEntry({ ...base, photoIds: [...base.photoIds, ...photos.map((p) => p.id)] });
      const now = new Date().toISOString();
      for (const p of photos) {
        await savePhoto(
          { id: p.id, benchEntryId: saved.id, contentType: p.contentType, byteSize: p.byteSize, sha256: p.sha256, caption: p.caption.trim().slice(0, 500), takenAt: p.takenAt, authorId: identity.userId, createdAt: now },
          p.blob,
        );
      }
      if (navigator.onLine) void syncNow();
      onSaved(saved.id);
    } catch (error) {
      setSaveError(isZodError(error) ? error.issues.map((i) => `${i.path.join('.') || 'entry'}: ${i.message}`).join('; ') : error instanceof Error ? error.message : 'The entry could not be saved on this device.');
    }
  });

  const fieldProps = (name: keyof BenchEntryFormValues) => ({ id: `bench-${name}`, 'aria-invalid': !!errors[name], 'aria-describedby': errors[name] ? `bench-${name}-error` : undefined });
  const fieldError = (name: keyof BenchEntryFormValues) =>
    errors[name] ? (
      <p id={`bench-${name}-error`} className="field-error">
        {errors[name]?.message}
      </p>
    ) : null;

  return (
    <form onSubmit={onSubmit} noValidate className="panel space-y-4" aria-label={existing ? 'Edit bench entry' : 'New bench entry'}>
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label htmlFor="bench-lotRef" className="field-label">
            Lot
          </label>
          <input className="field-input" list="bench-known-lots" autoComplete="off" placeholder="e.g. CR-LC-2611-04" {...fieldProps('lotRef')} {...form.register('lotRef')} />
          <datalist id="bench-known-lots">
            {knownLots.map((l) => (
              <option key={l} value={l} />
            ))}
          </datalist>
          {fieldError('lotRef')}
        </div>
        <div>
          <label htmlFor="bench-areaId" className="field-label">
            Area
          </label>
          <select className="field-input" {...fieldProps('areaId')} {...form.register('areaId')}>
            <option value="">No area</option>
            {areas.map((a) => (
              <option key={a.id} value={a.id}>
                {a.name}
              </option>
            ))}
          </select>
          {fieldError('areaId')}
        </div>
      </div>
      <div>
        <label htmlFor="bench-note" className="field-label">
          Note
        </label>
        <textarea className="field-input min-h-32" rows={5} {...fieldProps('note')} {...form.register('note')} />
        {fieldError('note')}
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label htmlFor="bench-tags" className="field-label">
            Tags <span className="font-normal">(separate with commas)</span>
          </label>
          <input className="field-input" autoComplete="off" placeholder="e.g. dissolver, label" {...fieldProps('tags')} {...form.register('tags')} />
          {fieldError('tags')}
        </div>
        <div>
          <label htmlFor="bench-sheetId" className="field-label">
            Sheet <span className="font-normal">(optional)</span>
          </label>
          {sheets === undefined ? (
            <p className="mt-1 text-sm text-ink-soft">Reading this device’s sheets…</p>
          ) : (
            <select className="field-input" {...fieldProps('sheetId')} {...form.register('sheetId')}>
              <option value="">Not tied to a sheet</option>
              {sheetChoices.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.label}
                </option>
              ))}
            </select>
          )}
          {lot && sheets && sheetChoices.length === 0 && <p className="mt-1 text-xs text-ink-soft">No sheets for lot {lot} on this device.</p>}
          {fieldError('sheetId')}
        </div>
      </div>

      <fieldset className="space-y-3">
        <legend className="field-label">Photos</legend>
        {entry && entry.photoIds.length > 0 && <p className="text-sm text-ink-soft">{entry.photoIds.length} saved {entry.photoIds.length === 1 ? 'photo stays' : 'photos stay'} with the entry (photos are never changed once saved).</p>}
        <PhotoPicker onPicked={(p) => setPhotos((list) => [...list, p])} disabled={isSubmitting} />
        {photos.length > 0 && (
          <ul className="grid gap-3 sm:grid-cols-2" aria-label="Photos to add">
            {photos.map((p, i) => (
              <li key={p.id} className="flex gap-3 rounded-md border border-rule p-2">
                {/* eslint-disable-next-line @next/next/no-img-element -- a blob on this device */}
                <img src={previews.find((x) => x.id === p.id)?.url} alt={`New photo ${i + 1}`} className="h-20 w-24 rounded object-cover" />
                <div className="min-w-0 flex-1 space-y-1">
                  <label htmlFor={`caption-${p.id}`} className="field-label">
                    Caption of photo {i + 1}
                  </label>
                  <input id={`caption-${p.id}`} className="field-input" maxLength={500} value={p.caption} onChange={(e) => setPhotos((list) => list.map((x) => (x.id === p.id ? { ...x, caption: e.target.value } : x)))} />
                  <p className="text-xs text-ink-soft">
                    {p.width}×{p.height}, {formatBytes(p.byteSize)}
                  </p>
                </div>
                <button type="button" className="btn-quiet self-start" onClick={() => setPhotos((list) => list.filter((x) => x.id !== p.id))} aria-label={`Leave out photo ${i + 1}`}>
                  ✕
                </button>
              </li>
            ))}
          </ul>
        )}
      </fieldset>

      {saveError && <FormAlert>Not saved: {saveError}</FormAlert>}
      <div className="flex flex-wrap gap-2">
        <button type="submit" className="btn-primary" disabled={isSubmitting}>
          {existing ? 'Save changes' : 'Save entry'}
        </button>
        <button type="button" className="btn-quiet" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
