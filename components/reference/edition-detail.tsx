'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { postJson } from '@/components/ui/post-json';
import { rejectSchema, updateDraftSchema } from '@/lib/editions/form-schemas';
import type { ReferenceValue } from '@/lib/reference/properties';
import { CsvImport } from './csv-import';
import { DiffView } from './diff-view';
import { useEditionList } from './editions-list';
import { type EditionInfo, formatDate, getJson } from './format';
import { ReferenceTable } from './reference-table';
import { StateBadge } from './state-badge';
import { ValueEditor } from './value-editor';

export interface EditionDetailProps {
  editionId: string;
  userId: string;
  canApprove: boolean;
}

type Note = { kind: 'ok' | 'error'; text: string } | null;

/** One edition: its facts, its changes against its base, its values, and the workflow actions the user may take. */
export function EditionDetail({ editionId, userId, canApprove }: EditionDetailProps) {
  const qc = useQueryClient();
  const detail = useQuery({ queryKey: ['editions', 'one', editionId], queryFn: () => getJson<{ edition: EditionInfo; values: ReferenceValue[] }>(`/api/v1/editions/${editionId}`) });
  const list = useEditionList();
  const [note, setNote] = useState<Note>(null);
  const [picked, setPicked] = useState<ReferenceValue | null>(null);

  const step = useMutation({
    mutationFn: async (v: { action: 'submit' | 'approve' | 'rebase' | 'reject' | 'withdraw' | 'discard'; body?: unknown }) => {
      const res = await postJson<{ carried?: number; conflicts?: { key: string }[] }>(`/api/v1/editions/${editionId}/${v.action}`, v.body ?? {});
      if (!res.ok) throw new Error(res.message);
      return { action: v.action, data: res.data };
    },
    onSuccess: ({ action, data }) => {
      const text =
        action === 'submit' ? 'Submitted for review; the supervisors have been e-mailed.'
        : action === 'approve' ? 'Approved: this edition is now in force, and the site has been e-mailed.'
        : action === 'reject' ? 'Sent back to draft with your reason.'
        : action === 'withdraw' ? 'Withdrawn from review: it is a draft again, yours to change.'
        : action === 'discard' ? 'Discarded: kept here, readable, but it can no longer be submitted.'
        : `Rebased: ${data.carried} change(s) carried onto the edition in force.` +
          (data.conflicts?.length ? ` ${data.conflicts.length} value(s) had also changed there; this draft's value was kept: ${data.conflicts.map((c) => c.key.split('|').slice(0, 3).join(' ')).join('; ')}.` : '');
      setNote({ kind: 'ok', text });
      void qc.invalidateQueries({ queryKey: ['editions'] });
    },
    onError: (e) => setNote({ kind: 'error', text: e.message }),
  });

  if (detail.isPending) return <p role="status">Loading the edition…</p>;
  if (detail.isError) return <p role="alert" className="field-error">{(detail.error as Error).message}</p>;
  const { edition: e, values } = detail.data;
  const people = list.data?.people ?? {};
  const inForce = list.data?.editions.find((x) => x.state === 'in_force') ?? null;
  const base = list.data?.editions.find((x) => x.id === e.baseEditionId) ?? null;
  const isAuthor = e.authorUserId === userId;
  const fromMemory = values.filter((v) => v.fromMemory).length;
  const open = e.state === 'draft' || e.state === 'in_review';
  const stale = open && list.data !== undefined && (inForce?.id ?? null) !== e.baseEditionId;
  const mayRebase = stale && inForce !== null && (isAuthor || (e.state === 'in_review' && canApprove));

  return (
    <div className="space-y-6">
      <header className="space-y-2">
        <p className="text-sm">
          <Link href="/editions" className="underline">
            All editions
          </Link>
        </p>
        <div className="flex flex-wrap items-center gap-3">
          <h1>Edition No. {e.number}</h1>
          <StateBadge state={e.state} />
        </div>
        <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
          <div>
            <dt className="inline text-ink-soft">Author: </dt>
            <dd className="inline">{people[e.authorUserId] ?? '—'}</dd>
          </div>
          <div>
            <dt className="inline text-ink-soft">Approved by: </dt>
            <dd className="inline">{e.approverUserId ? (people[e.approverUserId] ?? '—') : '—'}</dd>
          </div>
          <div>
            <dt className="inline text-ink-soft">Drafted from: </dt>
            <dd className="inline">{base ? `No. ${base.number}` : 'nothing (the first edition)'}</dd>
          </div>
          <div>
            <dt className="inline text-ink-soft">Values: </dt>
            <dd className="inline tabular-nums">
              {e.valueCount}
              {fromMemory ? ` (${fromMemory} supplied from memory, without a checked source)` : ''}
            </dd>
          </div>
          <div>
            <dt className="inline text-ink-soft">In force: </dt>
            <dd className="inline">
              {formatDate(e.inForceAt)}
              {e.retiredAt ? ` until ${formatDate(e.retiredAt)}` : ''}
            </dd>
          </div>
          <div>
            <dt className="inline text-ink-soft">Submitted: </dt>
            <dd className="inline">{formatDate(e.submittedAt)}</dd>
          </div>
        </dl>
        <div className="flex flex-wrap gap-2">
          <a href={`/api/v1/editions/${e.id}/export`} download className="btn-quiet">
            Export as CSV
          </a>
        </div>
      </header>

      {e.state === 'draft' && e.rejectionReason ? (
        <p className="panel border-ember-500 text-sm" role="note">
          <strong>Sent back by {people[e.rejectedByUserId ?? ''] ?? 'a supervisor'}:</strong> {e.rejectionReason}
        </p>
      ) : null}

      {stale ? (
        <div className="panel space-y-2 border-brine-500" role="note">
          <p className="text-sm">
            <strong>Rebase first.</strong> This edition was drafted from {base ? `No. ${base.number}` : 'no edition'}, but {inForce ? `No. ${inForce.number}` : 'no edition'} is in force now.
            It cannot be approved until its changes are carried onto the edition in force.
          </p>
          {mayRebase ? (
            <button type="button" className="btn-primary" disabled={step.isPending} onClick={() => step.mutate({ action: 'rebase' })}>
              Rebase onto No. {inForce!.number}
            </button>
          ) : null}
        </div>
      ) : null}

      {note ? (
        <p role={note.kind === 'error' ? 'alert' : 'status'} className={note.kind === 'error' ? 'field-error' : 'panel text-sm text-verdigris-700'}>
          {note.text}
        </p>
      ) : null}

      <SummaryPanel edition={e} editable={e.state === 'draft' && isAuthor} onSaved={() => void qc.invalidateQueries({ queryKey: ['editions'] })} />

      {e.state === 'draft' && isAuthor ? (
        <div className="panel space-y-2">
          <h2>Submit for review</h2>
          <p className="text-sm text-ink-soft">A supervisor other than you approves or rejects it. You cannot change it while it is in review.</p>
          <button type="button" className="btn-primary" disabled={step.isPending} onClick={() => step.mutate({ action: 'submit' })}>
            Submit edition No. {e.number} for review
          </button>
        </div>
      ) : null}

      {e.state === 'in_review' && canApprove && !isAuthor ? <ReviewPanel number={e.number} busy={step.isPending} onApprove={() => step.mutate({ action: 'approve' })} onReject={(reason) => step.mutate({ action: 'reject', body: { reason } })} /> : null}
      {e.state === 'in_review' && isAuthor ? (
        <div className="panel space-y-2">
          <p className="text-sm text-ink-soft">Waiting for a supervisor other than you to review it. To change it first, take it back out of review.</p>
          <button type="button" className="btn-quiet" disabled={step.isPending} onClick={() => step.mutate({ action: 'withdraw' })}>
            Withdraw edition No. {e.number} from review
          </button>
        </div>
      ) : null}
      {e.state === 'draft' && (isAuthor || canApprove) ? <DiscardPanel number={e.number} busy={step.isPending} onDiscard={() => step.mutate({ action: 'discard' })} /> : null}

      {e.baseEditionId ? (
        <section aria-labelledby="changes-title" className="panel space-y-2">
          <h2 id="changes-title">Changes against {base ? `No. ${base.number}` : 'its base'}</h2>
          <DiffView fromId={e.baseEditionId} toId={e.id} />
        </section>
      ) : null}

      {e.state === 'draft' && isAuthor ? (
        <>
          <ValueEditor editionId={e.id} revision={e.revision} picked={picked} />
          <CsvImport editionId={e.id} />
        </>
      ) : null}

      <section aria-labelledby="values-title" className="space-y-2">
        <h2 id="values-title">Values</h2>
        <ReferenceTable
          values={values}
          caption={`Values of edition No. ${e.number}`}
          onEdit={e.state === 'draft' && isAuthor ? (v) => { setPicked(v); document.getElementById('value-editor-title')?.scrollIntoView(); } : undefined}
        />
      </section>
    </div>
  );
}

function SummaryPanel({ edition, editable, onSaved }: { edition: EditionInfo; editable: boolean; onSaved: () => void }) {
  const form = useForm<{ changeSummary: string }>({ resolver: zodResolver(updateDraftSchema), values: { changeSummary: edition.changeSummary } });
  const [saved, setSaved] = useState<Note>(null);
  const { errors, isSubmitting } = form.formState;
  if (!editable) {
    return (
      <section className="panel" aria-labelledby="summary-title">
        <h2 id="summary-title">What it changes</h2>
        <p className="mt-1 whitespace-pre-line text-sm">{edition.changeSummary || '(no summary)'}</p>
      </section>
    );
  }
  const onSubmit = form.handleSubmit(async (v) => {
    const res = await postJson(`/api/v1/editions/${edition.id}`, v, 'PATCH');
    if (res.ok) {
      setSaved({ kind: 'ok', text: 'Summary saved.' });
      onSaved();
    } else {
      setSaved({ kind: 'error', text: res.message });
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="panel space-y-2">
      <label htmlFor="change-summary" className="field-label">
        What this edition changes, and why (required to submit)
      </label>
      <textarea id="change-summary" rows={3} className="field-input" aria-invalid={!!errors.changeSummary} {...form.register('changeSummary')} />
      {errors.changeSummary ? <p className="field-error">{errors.changeSummary.message}</p> : null}
      <button type="submit" className="btn-quiet" disabled={isSubmitting}>
        Save the summary
      </button>
      {saved ? (
        <p role={saved.kind === 'error' ? 'alert' : 'status'} className={saved.kind === 'error' ? 'field-error' : 'text-sm text-verdigris-700'}>
          {saved.text}
        </p>
      ) : null}
    </form>
  );
}

/** Two steps, so a draft is never discarded by a stray tap. */
function DiscardPanel({ number, busy, onDiscard }: { number: number; busy: boolean; onDiscard: () => void }) {
  const [asking, setAsking] = useState(false);
  return (
    <div className="panel space-y-2">
      <h2>Discard this draft</h2>
      <p className="text-sm text-ink-soft">Edition No. {number} stays listed and readable, with its values and history, but it can never be submitted or changed again.</p>
      {asking ? (
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn-danger" disabled={busy} onClick={onDiscard}>
            Yes, discard edition No. {number}
          </button>
          <button type="button" className="btn-quiet" onClick={() => setAsking(false)}>
            Keep it
          </button>
        </div>
      ) : (
        <button type="button" className="btn-quiet" onClick={() => setAsking(true)}>
          Discard edition No. {number}…
        </button>
      )}
    </div>
  );
}

function ReviewPanel({ number, busy, onApprove, onReject }: { number: number; busy: boolean; onApprove: () => void; onReject: (reason: string) => void }) {
  const form = useForm<{ reason: string }>({ resolver: zodResolver(rejectSchema), defaultValues: { reason: '' } });
  const { errors } = form.formState;
  return (
    <section aria-labelledby="review-title" className="panel space-y-3">
      <h2 id="review-title">Review</h2>
      <p className="text-sm text-ink-soft">Check the changes below against their sources. Approving puts No. {number} in force for the whole site and retires the edition in force now.</p>
      <button type="button" className="btn-primary" disabled={busy} onClick={onApprove}>
        Approve edition No. {number}
      </button>
      <form onSubmit={form.handleSubmit((v) => onReject(v.reason))} noValidate className="space-y-2 border-t border-rule pt-3">
        <label htmlFor="reject-reason" className="field-label">
          Reason for sending it back to draft
        </label>
        <textarea id="reject-reason" rows={2} className="field-input" aria-invalid={!!errors.reason} {...form.register('reason')} />
        {errors.reason ? <p className="field-error">{errors.reason.message}</p> : null}
        <button type="submit" className="btn-danger" disabled={busy}>
          Send back to draft
        </button>
      </form>
    </section>
  );
}
