'use client';
// One sheet on screen: the workbench of its kind, its title/lot/area/note, saving through the local
// store (so it works the same offline), the status steps draft → submitted → signed off, and the PDF.
import { useRouter } from 'next/navigation';
import { useEffect, useMemo, useState } from 'react';
import { deleteSheet, LocalStoreError, newSheet, saveSheet, startNewSheetVersion, syncNow, useEditionInForce, type LocalRecord, type Sheet, type SheetKind } from '@/lib/local';
import { ENGINE_VERSION } from '@/lib/thermo/version';
import { buildCycleSheet } from '@/lib/workbench/cycle-sheet';
import type { SheetBuild } from '@/lib/workbench/dissolution-sheet';
import { editionFromCache, editionLabel, saltSuggestions } from '@/lib/workbench/edition-source';
import { DISPLAY_UNITS } from '@/lib/workbench/format-energy';
import { KIND_TEXT, mayEdit, mayReturnToDraft, maySignOff, maySubmit, STATUS_TEXT } from '@/lib/workbench/sheet-rules';
import { isZodError } from '@/lib/validation/zod-mini';
import { makeValueSource } from '@/lib/workbench/value-source';
import { CycleWorkbench } from './cycle-workbench';
import { Field } from '@/components/ui/field';
import { exportSheetPdf } from './export-pdf';
import { formOf, type AnyForm } from './sheet-forms';
import type * as OtherKindsModule from './other-kinds';

type OtherKinds = typeof OtherKindsModule;
const EMPTY_BUILD: SheetBuild = { errors: [], request: null, inputs: [], outcome: null, editionIds: [] };
import { Segmented } from './segmented';
import { useUnit } from './use-unit';
import type { WorkbenchContext } from './workbench-context';

export interface SheetEditorProps {
  ctx: WorkbenchContext;
  kind: SheetKind;
  /** The saved sheet (live from the local store), or null for a new one. */
  record: LocalRecord<Sheet> | null;
  /** A new sheet's lot or batch reference, e.g. from the bench log's `?lot=`. */
  initialLotRef?: string;
}

interface Meta {
  title: string;
  lotRef: string;
  areaId: string;
  note: string;
}

export function SheetEditor({ ctx, kind, record, initialLotRef }: SheetEditorProps) {
  const router = useRouter();
  const sheet = record?.content ?? null;
  const who = ctx.identity;
  const [unit, setUnit] = useUnit(who.userId, ctx.preferredUnit);
  const cached = useEditionInForce();
  const edition = useMemo(() => editionFromCache(cached?.edition), [cached]);
  const values = useMemo(() => makeValueSource(edition, sheet ? { problem: sheet.problem, inputs: sheet.inputs } : null), [edition, sheet]);
  const suggestions = useMemo(() => saltSuggestions(edition?.values ?? []), [edition]);
  const [meta, setMeta] = useState<Meta>({ title: sheet?.title ?? '', lotRef: sheet ? (sheet.lotRef ?? '') : (initialLotRef ?? ''), areaId: sheet?.areaId ?? '', note: sheet?.note ?? '' });
  const [form, setForm] = useState<AnyForm>(() => formOf(kind, sheet));
  const [message, setMessage] = useState<{ tone: 'ok' | 'error'; text: string } | null>(null);
  const [metaErrors, setMetaErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);

  // Other kinds load their module on demand (see other-kinds.tsx).
  const [other, setOther] = useState<OtherKinds | null>(null);
  useEffect(() => {
    if (kind !== 'cycle') void import('./other-kinds').then((m) => setOther(m));
  }, [kind]);
  const built = useMemo(() => {
    if (form.kind === 'cycle') return { kind: 'cycle' as const, b: buildCycleSheet(form.form, values) };
    return other ? other.buildOther(form, values) : null;
  }, [form, values, other]);
  const build: SheetBuild = built?.b ?? EMPTY_BUILD;

  const status = sheet?.status ?? 'draft';
  const base = sheet ?? { status: 'draft' as const, authorId: who.userId };
  const edit = mayEdit(base, who);
  const locked = !edit.ok;
  const solved = build.outcome !== null && build.errors.length === 0;
  const pinnedId = sheet && locked ? sheet.pinnedEditionId : (build.editionIds[0] ?? sheet?.pinnedEditionId ?? edition?.id ?? null);
  const pinnedText = pinnedId && edition && pinnedId === edition.id ? editionLabel(edition) : pinnedId ? `edition ${pinnedId.slice(0, 8)} (pinned; not the one in force on this device)` : 'no edition on this device yet';
  const names = useMemo(() => Object.fromEntries(ctx.people.map((p) => [p.id, p.displayName])), [ctx.people]);
  // Offline the router cannot fetch the next page's payload: load the stored page instead.
  const go = (url: string, replace = false) => {
    if (!navigator.onLine) window.location[replace ? 'replace' : 'assign'](url);
    else if (replace) router.replace(url);
    else router.push(url);
  };

  function content(from: Sheet): Sheet {
    const request = build.request ?? { kind };
    return {
      ...from,
      title: meta.title,
      lotRef: meta.lotRef.trim() === '' ? null : meta.lotRef.trim(),
      areaId: meta.areaId === '' ? null : meta.areaId,
      note: meta.note,
      problem: { ...request, kind, form: form.form },
      inputs: build.inputs,
      result: build.outcome ?? null,
      pinnedEditionId: pinnedId,
      engineVersion: build.outcome?.engineVersion ?? ENGINE_VERSION,
    };
  }

  async function write(next: Sheet, done: string) {
    setBusy(true);
    setMetaErrors({});
    try {
      const saved = await saveSheet(next);
      setMessage({ tone: 'ok', text: `${done} Saved on this device${navigator.onLine ? '; syncing…' : '; it syncs when the device is back online.'}` });
      if (navigator.onLine) void syncNow();
      if (!sheet) go(`/sheets/open?id=${saved.id}`, true);
      return saved;
    } catch (e) {
      if (isZodError(e)) {
        const errs: Record<string, string> = {};
        for (const i of e.issues) errs[String(i.path[0] ?? 'sheet')] = i.message;
        setMetaErrors(errs);
        setMessage({ tone: 'error', text: `Not saved: ${e.issues.map((i) => `${i.path.join('.') || 'sheet'} — ${i.message}`).join('; ')}` });
      } else if (e instanceof LocalStoreError) setMessage({ tone: 'error', text: `Not saved: ${e.message}` });
      else setMessage({ tone: 'error', text: 'Not saved: the device could not store the sheet.' });
      return null;
    } finally {
      setBusy(false);
    }
  }

  const reasonMissing = build.errors.filter((e) => e.field.endsWith('.reason'));
  async function onSave() {
    if (!built) return;
    if (reasonMissing.length > 0) {
      setMessage({ tone: 'error', text: 'Not saved: every override needs its reason (see the step marked above).' });
      return;
    }
    await write(content(sheet ?? newSheet({ kind, title: meta.title })), 'Saved.');
  }
  const submit = maySubmit(base, who, solved);
  async function onSubmit() {
    if (!submit.ok) return;
    await write({ ...content(sheet ?? newSheet({ kind, title: meta.title })), status: 'submitted' }, 'Submitted for sign-off.');
  }
  const back = sheet ? mayReturnToDraft(sheet, who) : { ok: false as const, reason: '' };
  const signOff = sheet ? maySignOff(sheet, who) : { ok: false as const, reason: 'Save and submit the sheet first.' };
  async function onSignOff() {
    if (!sheet || !signOff.ok) return;
    await write({ ...sheet, status: 'signed_off', signedOffBy: who.userId, signedOffAt: new Date().toISOString() }, 'Signed off; this version is now locked.');
  }
  async function onNewVersion() {
    if (!sheet) return;
    try {
      const next = await startNewSheetVersion(sheet.id);
      if (navigator.onLine) void syncNow();
      go(`/sheets/open?id=${next.id}`);
    } catch (e) {
      setMessage({ tone: 'error', text: e instanceof Error ? e.message : 'Could not start a new version.' });
    }
  }
  async function onDelete() {
    if (!sheet || !window.confirm(`Delete “${sheet.title}”? It is kept as a deleted record and synced.`)) return;
    await deleteSheet(sheet.id);
    if (navigator.onLine) void syncNow();
    go('/sheets');
  }
  async function onPdf() {
    const s = sheet && locked ? sheet : content(sheet ?? newSheet({ kind, title: meta.title || 'Untitled sheet' }));
    await exportSheetPdf(s, { unit, names, editionText: pinnedText, areaName: ctx.areas.find((a) => a.id === s.areaId)?.name ?? null });
  }

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm text-ink-soft">
            {KIND_TEXT[kind]} · sheet version {sheet?.version ?? 1}
          </p>
          <h1>{sheet ? sheet.title : `New ${KIND_TEXT[kind].toLowerCase()} sheet`}</h1>
          <p className="mt-1 text-sm">
            <span className={`mr-2 rounded px-2 py-0.5 text-xs font-semibold ${status === 'signed_off' ? 'bg-verdigris-700 text-white' : status === 'submitted' ? 'bg-brine-50 text-brine-700 ring-1 ring-brine-500' : 'bg-paper-deep text-ink'}`} data-testid="sheet-status">
              {STATUS_TEXT[status]}
            </span>
            Pinned to {pinnedText} · {sheet?.engineVersion ?? ENGINE_VERSION}
            {' · '}
            <span data-testid="sync-state">{record?.pending ? 'waiting to sync' : record ? 'synced' : 'not saved yet'}</span>
          </p>
          {record?.awaitingReview ? <p className="mt-1 text-sm text-ember-700">A supervisor is settling a conflicting edit of this sheet; you see the server’s version.</p> : null}
          {record?.resultDiffers ? <p className="mt-1 text-sm text-ember-700">The server’s recomputed result differs from this device’s; the server’s is kept on record.</p> : null}
        </div>
        <Segmented legend="Energy unit" name="unit" value={unit} options={DISPLAY_UNITS.map((u) => ({ value: u, label: u }))} onChange={setUnit} />
      </div>

      {locked ? (
        <p className="rounded-md border border-rule bg-paper-deep p-3 text-sm" role="note">
          {edit.ok ? '' : edit.reason}
        </p>
      ) : null}

      <section aria-labelledby="sheet-details" className="panel">
        <h2 id="sheet-details">Sheet</h2>
        <fieldset disabled={locked} className="mt-2 grid gap-4 sm:grid-cols-2">
          <Field label="Title" error={metaErrors.title}>
            {(p) => <input {...p} className="field-input" value={meta.title} onChange={(e) => setMeta({ ...meta, title: e.target.value })} />}
          </Field>
          <Field label="Lot or batch reference" error={metaErrors.lotRef}>
            {(p) => <input {...p} className="field-input" value={meta.lotRef} onChange={(e) => setMeta({ ...meta, lotRef: e.target.value })} />}
          </Field>
          <Field label="Area" error={metaErrors.areaId}>
            {(p) => (
              <select {...p} className="field-input" value={meta.areaId} onChange={(e) => setMeta({ ...meta, areaId: e.target.value })}>
                <option value="">—</option>
                {ctx.areas.map((a) => (
                  <option key={a.id} value={a.id}>
                    {a.name}
                  </option>
                ))}
              </select>
            )}
          </Field>
          <Field label="Note" error={metaErrors.note} className="sm:col-span-2">
            {(p) => <textarea {...p} rows={2} className="field-input" value={meta.note} onChange={(e) => setMeta({ ...meta, note: e.target.value })} />}
          </Field>
        </fieldset>
      </section>

      {!edition && !sheet ? <p className="rounded-md border border-ember-500 bg-ember-50 p-3 text-sm">This device has no reference edition yet: go online once so it can download the edition in force. Values can still be typed by hand, each with its source.</p> : null}

      {form.kind === 'cycle' && built?.kind === 'cycle' ? (
        <CycleWorkbench form={form.form} onChange={(f) => setForm({ kind: 'cycle', form: f })} build={built.b} unit={unit} suggestions={suggestions} locked={locked} />
      ) : null}
      {form.kind !== 'cycle' && other && built && built.kind !== 'cycle' ? <other.OtherKindPanel form={form} built={built} onChange={setForm} unit={unit} suggestions={suggestions} locked={locked} /> : null}
      {form.kind !== 'cycle' && !other ? <p className="text-sm text-ink-soft">Opening the workbench…</p> : null}

      <section aria-labelledby="sheet-actions" className="panel space-y-3 print:hidden">
        <h2 id="sheet-actions">Save and sign-off</h2>
        {message ? (
          <p role={message.tone === 'error' ? 'alert' : 'status'} className={`text-sm ${message.tone === 'error' ? 'text-ember-700' : 'text-verdigris-700'}`}>
            {message.text}
          </p>
        ) : null}
        <div className="flex flex-wrap gap-3">
          {!locked ? (
            <button type="button" className="btn-primary" onClick={onSave} disabled={busy}>
              Save
            </button>
          ) : null}
          {status === 'draft' ? (
            <button type="button" className="btn-quiet" onClick={onSubmit} disabled={busy || !submit.ok} aria-describedby="submit-why">
              Submit for sign-off
            </button>
          ) : null}
          {back.ok ? (
            <button type="button" className="btn-quiet" onClick={() => sheet && write({ ...sheet, status: 'draft' }, 'Back to draft.')} disabled={busy}>
              Return to draft
            </button>
          ) : null}
          {status === 'submitted' ? (
            <button type="button" className="btn-primary" onClick={onSignOff} disabled={busy || !signOff.ok} aria-describedby="signoff-why">
              Sign off
            </button>
          ) : null}
          {status === 'signed_off' ? (
            <button type="button" className="btn-quiet" onClick={onNewVersion} disabled={busy}>
              Start a new version
            </button>
          ) : null}
          <button type="button" className="btn-quiet" onClick={onPdf}>
            Export PDF
          </button>
          {sheet && status !== 'signed_off' ? (
            <button type="button" className="btn-danger" onClick={onDelete}>
              Delete
            </button>
          ) : null}
        </div>
        {status === 'draft' && !submit.ok ? (
          <p id="submit-why" className="text-sm text-ink-soft">
            {submit.reason}
          </p>
        ) : null}
        {status === 'submitted' && !signOff.ok ? (
          <p id="signoff-why" className="text-sm text-ink-soft" data-testid="signoff-why">
            {signOff.reason}
          </p>
        ) : null}
        {sheet?.status === 'signed_off' ? (
          <p className="text-sm">
            Signed off by {names[sheet.signedOffBy ?? ''] ?? 'a supervisor'} at {sheet.signedOffAt ? new Date(sheet.signedOffAt).toLocaleString() : ''}.
          </p>
        ) : null}
        {sheet?.previousVersionId ? (
          <p className="text-sm">
            Follows version {sheet.version - 1}:{' '}
            <a className="text-verdigris-700 underline" href={`/sheets/open?id=${sheet.previousVersionId}`}>
              open the signed-off version
            </a>
          </p>
        ) : null}
      </section>
    </div>
  );
}
